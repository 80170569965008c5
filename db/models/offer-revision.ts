import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { Offer } from "#app/domain/part.ts";

/** One offer an offers intake wrote (or a rollback restored), with the offer it replaced. */
export class OfferRevision extends Model<InferAttributes<OfferRevision>, InferCreationAttributes<OfferRevision>> {
  declare id: CreationOptional<string>;
  declare partId: string;
  declare supplier: string;
  declare action: "intake" | "rollback";
  declare intakeId: string;
  declare before: Offer | null;
  declare after: Offer | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof OfferRevision {
    OfferRevision.init(
      {
        id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
        partId: { type: DataTypes.UUID, allowNull: false },
        supplier: { type: DataTypes.TEXT, allowNull: false },
        action: { type: DataTypes.TEXT, allowNull: false },
        intakeId: { type: DataTypes.UUID, allowNull: false },
        before: { type: DataTypes.JSONB, allowNull: true },
        after: { type: DataTypes.JSONB, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: "offer_revisions", updatedAt: false },
    );
    return OfferRevision;
  }
}
