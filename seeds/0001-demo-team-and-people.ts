import type { QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";
import { initModels } from "#db/models/index.ts";
import { demoPeople, demoTeam } from "./demo-people.ts";

export const up: MigrationFn<QueryInterface> = async () => {
  const { sequelize, Team, User, UserRole } = initModels();
  await sequelize.transaction(async (transaction) => {
    const [team] = await Team.findOrCreate({ where: { name: demoTeam.name }, transaction });
    for (const person of demoPeople) {
      const [user] = await User.findOrCreate({
        where: { email: person.email },
        defaults: { email: person.email, displayName: person.displayName, teamId: team.id, deactivatedAt: null, lastSignInAt: null },
        transaction,
      });
      for (const role of person.roles) {
        await UserRole.findOrCreate({ where: { userId: user.id, role }, transaction });
      }
    }
  });
};

export const down: MigrationFn<QueryInterface> = async () => {
  const { sequelize, Team, User } = initModels();
  await sequelize.transaction(async (transaction) => {
    await User.destroy({ where: { email: demoPeople.map((p) => p.email) }, transaction });
    await Team.destroy({ where: { name: demoTeam.name }, transaction });
  });
};
