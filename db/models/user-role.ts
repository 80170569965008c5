import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

export class UserRole extends Model<InferAttributes<UserRole>, InferCreationAttributes<UserRole>> {
  declare userId: string;
  declare role: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof UserRole {
    UserRole.init(
      {
        userId: { type: DataTypes.UUID, primaryKey: true },
        role: { type: DataTypes.TEXT, primaryKey: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: "user_roles", updatedAt: false },
    );
    return UserRole;
  }
}
