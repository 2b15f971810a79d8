import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One saved calculator result; `results` and `warnings` are always the server's own computation from `inputs`. */
export class Calculation extends Model<InferAttributes<Calculation>, InferCreationAttributes<Calculation>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare calculator: string;
  declare title: string;
  declare inputs: Record<string, unknown>;
  declare results: unknown;
  declare warnings: string[];
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Calculation.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        calculator: { type: DataTypes.STRING, allowNull: false },
        title: { type: DataTypes.STRING, allowNull: false },
        inputs: { type: DataTypes.JSON, allowNull: false },
        results: { type: DataTypes.JSON, allowNull: false },
        warnings: { type: DataTypes.JSON, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'calculations' },
    );
  }
}
