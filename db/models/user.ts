import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from "sequelize";
import type { UserRole } from "./user-role.ts";

export class User extends Model<InferAttributes<User, { omit: "roles" }>, InferCreationAttributes<User, { omit: "roles" }>> {
  declare id: CreationOptional<string>;
  declare email: string;
  declare displayName: string;
  declare teamId: string | null;
  declare active: CreationOptional<boolean>;
  declare deactivatedAt: Date | null;
  declare lastSignInAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare roles?: NonAttribute<UserRole[]>;

  static initModel(sequelize: Sequelize): typeof User {
    User.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        email: { type: DataTypes.TEXT, allowNull: false, unique: true },
        displayName: { type: DataTypes.TEXT, allowNull: false },
        teamId: { type: DataTypes.UUID, allowNull: true },
        active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        deactivatedAt: { type: DataTypes.DATE, allowNull: true },
        lastSignInAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "users" },
    );
    return User;
  }
}
