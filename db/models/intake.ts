import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from "sequelize";
import type { User } from "./user.ts";

export type IntakeState = "previewed" | "committed" | "discarded" | "rolled-back";

/** One uploaded file of datasheet values or offers, kept byte for byte, with its counts and state. */
export class Intake extends Model<InferAttributes<Intake, { omit: "uploader" }>, InferCreationAttributes<Intake, { omit: "uploader" }>> {
  declare id: string;
  declare kind: "parts" | "offers";
  declare fileName: string;
  declare sizeBytes: number;
  declare fileBytes: Buffer;
  declare uploadedBy: string;
  declare state: IntakeState;
  declare fileRefused: boolean;
  declare newCount: number;
  declare changedCount: number;
  declare unchangedCount: number;
  declare rejectedCount: number;
  declare warningCount: number;
  declare problemCount: number;
  /** [row, status, value, changes] per accepted row, as parsed and compared at preview. */
  declare parsedRows: CreationOptional<unknown[]>;
  declare comparedAtVersion: CreationOptional<string>;
  declare committedBy: CreationOptional<string | null>;
  declare committedAt: CreationOptional<Date | null>;
  declare discardedBy: CreationOptional<string | null>;
  declare discardedAt: CreationOptional<Date | null>;
  declare rolledBackBy: CreationOptional<string | null>;
  declare rolledBackAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare uploader?: NonAttribute<User>;

  static initModel(sequelize: Sequelize): typeof Intake {
    const count = { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 };
    Intake.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        kind: { type: DataTypes.TEXT, allowNull: false },
        fileName: { type: DataTypes.TEXT, allowNull: false },
        sizeBytes: { type: DataTypes.INTEGER, allowNull: false },
        fileBytes: { type: DataTypes.BLOB, allowNull: false },
        uploadedBy: { type: DataTypes.UUID, allowNull: false },
        state: { type: DataTypes.TEXT, allowNull: false },
        fileRefused: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        newCount: count,
        changedCount: count,
        unchangedCount: count,
        rejectedCount: count,
        warningCount: count,
        problemCount: count,
        parsedRows: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        comparedAtVersion: { type: DataTypes.BIGINT, allowNull: false, defaultValue: 0 },
        committedBy: { type: DataTypes.UUID, allowNull: true },
        committedAt: { type: DataTypes.DATE, allowNull: true },
        discardedBy: { type: DataTypes.UUID, allowNull: true },
        discardedAt: { type: DataTypes.DATE, allowNull: true },
        rolledBackBy: { type: DataTypes.UUID, allowNull: true },
        rolledBackAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "intakes" },
    );
    return Intake;
  }
}
