import { getSequelize } from "../sequelize.ts";
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

    Team.hasMany(User, { foreignKey: "teamId", as: "members" });
    User.belongsTo(Team, { foreignKey: "teamId", as: "team" });
    User.hasMany(UserRole, { foreignKey: "userId", as: "roles" });
    UserRole.belongsTo(User, { foreignKey: "userId" });
    initialised = true;
  }
  return { sequelize: getSequelize(), Team, User, UserRole };
}

export { Team, User, UserRole };
