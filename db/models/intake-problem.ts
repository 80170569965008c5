import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** One problem an intake found: a bad cell, row or file. */
export class IntakeProblem extends Model<InferAttributes<IntakeProblem>, InferCreationAttributes<IntakeProblem>> {
  declare intakeId: string;
  declare position: number;
  declare rowNumber: number | null;
  declare columnName: string | null;
  declare value: string | null;
  declare message: string;
  declare severity: "error" | "warning";

  static initModel(sequelize: Sequelize): typeof IntakeProblem {
    IntakeProblem.init(
      {
        intakeId: { type: DataTypes.UUID, primaryKey: true },
        position: { type: DataTypes.INTEGER, primaryKey: true },
        rowNumber: { type: DataTypes.INTEGER, allowNull: true },
        columnName: { type: DataTypes.TEXT, allowNull: true },
        value: { type: DataTypes.TEXT, allowNull: true },
        message: { type: DataTypes.TEXT, allowNull: false },
        severity: { type: DataTypes.TEXT, allowNull: false },
      },
      { sequelize, tableName: "intake_problems", timestamps: false },
    );
    return IntakeProblem;
  }
}
