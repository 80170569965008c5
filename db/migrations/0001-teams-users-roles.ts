import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable("teams", {
    id: { type: DataTypes.UUID, primaryKey: true },
    name: { type: DataTypes.TEXT, allowNull: false, unique: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.createTable("users", {
    id: { type: DataTypes.UUID, primaryKey: true },
    email: { type: DataTypes.TEXT, allowNull: false, unique: true },
    display_name: { type: DataTypes.TEXT, allowNull: false },
    team_id: { type: DataTypes.UUID, allowNull: true, references: { model: "teams", key: "id" }, onDelete: "SET NULL" },
    active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    deactivated_at: { type: DataTypes.DATE, allowNull: true },
    last_sign_in_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  // Addresses are stored lower-cased; the check keeps a second spelling out.
  await qi.sequelize.query(`ALTER TABLE users ADD CONSTRAINT users_email_lower CHECK (email = lower(email))`);
  await qi.createTable("user_roles", {
    user_id: { type: DataTypes.UUID, primaryKey: true, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
    role: { type: DataTypes.TEXT, primaryKey: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.sequelize.query(
    `ALTER TABLE user_roles ADD CONSTRAINT user_roles_known CHECK (role IN ('admin', 'librarian', 'engineer', 'purchaser'))`,
  );
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.dropTable("user_roles");
  await qi.dropTable("users");
  await qi.dropTable("teams");
};
