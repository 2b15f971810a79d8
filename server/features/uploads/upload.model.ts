import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A photo somebody uploaded; its three JPEG copies live on disk under DATA_DIR/uploads/ named by fileKey. */
export class Upload extends Model<InferAttributes<Upload>, InferCreationAttributes<Upload>> {
  declare id: CreationOptional<number>;
  declare ownerId: number;
  declare fileKey: string;
  declare width: number;
  declare height: number;
  /** Bytes on disk of all its stored sizes (what counts toward the owner's quota). */
  declare bytes: number;
  declare sourceType: string;
  declare claimedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Upload.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        ownerId: { type: DataTypes.INTEGER, allowNull: false },
        fileKey: { type: DataTypes.STRING, allowNull: false, unique: true },
        width: { type: DataTypes.INTEGER, allowNull: false },
        height: { type: DataTypes.INTEGER, allowNull: false },
        bytes: { type: DataTypes.INTEGER, allowNull: false },
        sourceType: { type: DataTypes.STRING, allowNull: false },
        claimedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'uploads' },
    );
  }
}
