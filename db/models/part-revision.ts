import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { PartSpec } from "#app/domain/part.ts";

/** One change to a part: values before (null when created) and after (null when removed), and what made it. */
export class PartRevision extends Model<InferAttributes<PartRevision>, InferCreationAttributes<PartRevision>> {
  declare id: CreationOptional<string>;
  declare partId: string;
  declare action: "intake" | "rollback" | "edit";
  declare intakeId: string | null;
  declare editorId: string | null;
  declare before: PartSpec | null;
  declare after: PartSpec | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof PartRevision {
    PartRevision.init(
      {
        id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
        partId: { type: DataTypes.UUID, allowNull: false },
        action: { type: DataTypes.TEXT, allowNull: false },
        intakeId: { type: DataTypes.UUID, allowNull: true },
        editorId: { type: DataTypes.UUID, allowNull: true },
        before: { type: DataTypes.JSONB, allowNull: true },
        after: { type: DataTypes.JSONB, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: "part_revisions", updatedAt: false },
    );
    return PartRevision;
  }
}
