import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { PriceBreak } from "#app/domain/part.ts";

/** One supplier's offer for one part (one per part and supplier). */
export class Offer extends Model<InferAttributes<Offer>, InferCreationAttributes<Offer>> {
  declare id: string;
  declare partId: string;
  declare supplier: string;
  declare supplierSku: string | null;
  declare stock: number;
  declare minimumOrder: number;
  declare orderMultiple: number;
  declare priceBreaks: PriceBreak[];
  declare currency: string;
  declare leadTimeDays: number | null;
  declare asOf: string;
  declare intakeId: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof Offer {
    Offer.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        partId: { type: DataTypes.UUID, allowNull: false },
        supplier: { type: DataTypes.TEXT, allowNull: false },
        supplierSku: { type: DataTypes.TEXT, allowNull: true },
        stock: { type: DataTypes.INTEGER, allowNull: false },
        minimumOrder: { type: DataTypes.INTEGER, allowNull: false },
        orderMultiple: { type: DataTypes.INTEGER, allowNull: false },
        priceBreaks: { type: DataTypes.JSONB, allowNull: false },
        currency: { type: DataTypes.TEXT, allowNull: false },
        leadTimeDays: { type: DataTypes.INTEGER, allowNull: true },
        asOf: { type: DataTypes.DATEONLY, allowNull: false },
        intakeId: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "offers" },
    );
    return Offer;
  }
}
