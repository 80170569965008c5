import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** One accepted row of an intake as parsed at preview (a part spec or an offer row), with its preview status. */
export class IntakeRowRecord extends Model<InferAttributes<IntakeRowRecord>, InferCreationAttributes<IntakeRowRecord>> {
  declare intakeId: string;
  declare rowNumber: number;
  declare status: "new" | "changed" | "unchanged";
  declare value: unknown;
  declare changes: unknown;

  static initModel(sequelize: Sequelize): typeof IntakeRowRecord {
    IntakeRowRecord.init(
      {
        intakeId: { type: DataTypes.UUID, primaryKey: true },
        rowNumber: { type: DataTypes.INTEGER, primaryKey: true },
        status: { type: DataTypes.TEXT, allowNull: false },
        value: { type: DataTypes.JSONB, allowNull: false },
        changes: { type: DataTypes.JSONB, allowNull: false },
      },
      { sequelize, tableName: "intake_rows", timestamps: false },
    );
    return IntakeRowRecord;
  }
}
