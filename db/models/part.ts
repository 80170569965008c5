import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { GainPoint, SaturationPoint } from "#app/domain/part.ts";

/** One orderable device; every electrical value in SI base units, temperatures in °C. */
export class Part extends Model<InferAttributes<Part>, InferCreationAttributes<Part>> {
  declare id: string;
  declare manufacturer: string;
  declare partNumber: string;
  declare polarity: string;
  declare packageName: string;
  declare configuration: string;
  declare vceoVolts: number;
  declare vcboVolts: number | null;
  declare veboVolts: number | null;
  declare icMaxAmps: number;
  declare ptotWatts: number | null;
  declare ptotReference: string | null;
  declare tjMaxC: number | null;
  declare rthJaCPerW: number | null;
  declare rthJcCPerW: number | null;
  declare gainPoints: GainPoint[];
  declare saturationPoints: SaturationPoint[];
  declare vbeOnVolts: number | null;
  declare ftHz: number | null;
  declare cobFarads: number | null;
  declare earlyVolts: number | null;
  declare lifecycle: string;
  declare datasheetUrl: string | null;
  declare datasheetRevisionDate: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof Part {
    const volts = { type: DataTypes.DOUBLE, allowNull: true };
    Part.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        manufacturer: { type: DataTypes.TEXT, allowNull: false },
        partNumber: { type: DataTypes.TEXT, allowNull: false },
        polarity: { type: DataTypes.TEXT, allowNull: false },
        packageName: { type: DataTypes.TEXT, allowNull: false },
        configuration: { type: DataTypes.TEXT, allowNull: false },
        vceoVolts: { type: DataTypes.DOUBLE, allowNull: false },
        vcboVolts: volts,
        veboVolts: volts,
        icMaxAmps: { type: DataTypes.DOUBLE, allowNull: false },
        ptotWatts: volts,
        ptotReference: { type: DataTypes.TEXT, allowNull: true },
        tjMaxC: volts,
        rthJaCPerW: { type: DataTypes.DOUBLE, allowNull: true, field: "rth_ja_c_per_w" },
        rthJcCPerW: { type: DataTypes.DOUBLE, allowNull: true, field: "rth_jc_c_per_w" },
        gainPoints: { type: DataTypes.JSONB, allowNull: false },
        saturationPoints: { type: DataTypes.JSONB, allowNull: false },
        vbeOnVolts: volts,
        ftHz: volts,
        cobFarads: volts,
        earlyVolts: volts,
        lifecycle: { type: DataTypes.TEXT, allowNull: false },
        datasheetUrl: { type: DataTypes.TEXT, allowNull: true },
        datasheetRevisionDate: { type: DataTypes.DATEONLY, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "parts" },
    );
    return Part;
  }
}
