import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { Role, UnitSystem } from '@shared/schemas/user';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  /** Stored lower-case, so that comparisons are case-insensitive. */
  declare email: string;
  declare name: string;
  declare role: Role;
  /** Null for an account that has never set a password. */
  declare passwordHash: string | null;
  declare active: CreationOptional<boolean>;
  declare unitSystem: CreationOptional<UnitSystem>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    User.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        email: {
          type: DataTypes.STRING,
          allowNull: false,
          unique: true,
          set(value: string) {
            this.setDataValue('email', value.trim().toLowerCase());
          },
        },
        name: { type: DataTypes.STRING, allowNull: false },
        role: { type: DataTypes.STRING, allowNull: false },
        passwordHash: { type: DataTypes.STRING, allowNull: true },
        active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        unitSystem: { type: DataTypes.STRING, allowNull: false, defaultValue: 'metric' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'users' },
    );
  }
}
