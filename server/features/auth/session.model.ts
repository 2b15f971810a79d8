import { DataTypes, Model, type Sequelize } from 'sequelize';

/** Sessions live in SQLite (via connect-session-sequelize) so that they survive a restart. */
export class Session extends Model {
  declare sid: string;
  declare userId: number | null;
  declare expires: Date | null;
  declare data: string | null;

  static initModel(sequelize: Sequelize) {
    Session.init(
      {
        sid: { type: DataTypes.STRING, primaryKey: true },
        userId: { type: DataTypes.INTEGER, allowNull: true },
        expires: { type: DataTypes.DATE, allowNull: true },
        data: { type: DataTypes.TEXT, allowNull: true },
      },
      { sequelize, tableName: 'sessions', modelName: 'Session' },
    );
  }
}
