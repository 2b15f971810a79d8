import { DataTypes, type QueryInterface } from 'sequelize';

/** Password-reset tokens: only a sha256 of each token is stored, so a copy of the database cannot reset anything. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('password_resets', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    userId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expiresAt: { type: DataTypes.DATE, allowNull: false },
    usedAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('password_resets', ['userId']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('password_resets');
}
