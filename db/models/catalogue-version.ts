import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** The single-row counter of catalogue changes (design section 10); its row is also the catalogue's write lock. */
export class CatalogueVersion extends Model<InferAttributes<CatalogueVersion>, InferCreationAttributes<CatalogueVersion>> {
  declare id: number;
  declare version: string;
  declare changedAt: Date;

  static initModel(sequelize: Sequelize): typeof CatalogueVersion {
    CatalogueVersion.init(
      {
        id: { type: DataTypes.SMALLINT, primaryKey: true },
        version: { type: DataTypes.BIGINT, allowNull: false },
        changedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, tableName: "catalogue_version", timestamps: false },
    );
    return CatalogueVersion;
  }
}
