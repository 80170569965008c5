import { getSequelize } from "../sequelize.ts";
import { CatalogueVersion } from "./catalogue-version.ts";
import { Intake } from "./intake.ts";
import { IntakeProblem } from "./intake-problem.ts";
import { Offer } from "./offer.ts";
import { OfferRevision } from "./offer-revision.ts";
import { Part } from "./part.ts";
import { PartRevision } from "./part-revision.ts";
import { Team } from "./team.ts";
import { User } from "./user.ts";
import { UserRole } from "./user-role.ts";

// Every model is initialised and every association declared here, once per process.
let initialised = false;

export function initModels() {
  if (!initialised) {
    const sequelize = getSequelize();
    Team.initModel(sequelize);
    User.initModel(sequelize);
    UserRole.initModel(sequelize);
    Part.initModel(sequelize);
    Offer.initModel(sequelize);
    Intake.initModel(sequelize);
    IntakeProblem.initModel(sequelize);
    PartRevision.initModel(sequelize);
    OfferRevision.initModel(sequelize);
    CatalogueVersion.initModel(sequelize);

    Team.hasMany(User, { foreignKey: "teamId", as: "members" });
    User.belongsTo(Team, { foreignKey: "teamId", as: "team" });
    User.hasMany(UserRole, { foreignKey: "userId", as: "roles" });
    UserRole.belongsTo(User, { foreignKey: "userId" });

    Part.hasMany(Offer, { foreignKey: "partId", as: "offers" });
    Offer.belongsTo(Part, { foreignKey: "partId", as: "part" });
    Part.hasMany(PartRevision, { foreignKey: "partId", as: "revisions" });
    PartRevision.belongsTo(Part, { foreignKey: "partId", as: "part" });
    PartRevision.belongsTo(Intake, { foreignKey: "intakeId", as: "intake" });
    PartRevision.belongsTo(User, { foreignKey: "editorId", as: "editor" });
    Intake.belongsTo(User, { foreignKey: "uploadedBy", as: "uploader" });
    Intake.hasMany(IntakeProblem, { foreignKey: "intakeId", as: "problems" });
    Intake.hasMany(PartRevision, { foreignKey: "intakeId", as: "partRevisions" });
    Intake.hasMany(OfferRevision, { foreignKey: "intakeId", as: "offerRevisions" });
    OfferRevision.belongsTo(Part, { foreignKey: "partId", as: "part" });
    initialised = true;
  }
  return {
    sequelize: getSequelize(),
    Team,
    User,
    UserRole,
    Part,
    Offer,
    Intake,
    IntakeProblem,
    PartRevision,
    OfferRevision,
    CatalogueVersion,
  };
}

export { CatalogueVersion, Intake, IntakeProblem, Offer, OfferRevision, Part, PartRevision, Team, User, UserRole };
