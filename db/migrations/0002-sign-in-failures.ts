import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

// Wrong codes are counted on the server, per e-mailed code, so clearing a cookie does not reset the limit.
export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable("sign_in_failures", {
    challenge_hash: { type: DataTypes.TEXT, primaryKey: true },
    failures: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.dropTable("sign_in_failures");
};
