import { DataTypes, type QueryInterface } from 'sequelize';

/** The first answer to a request sent with an Idempotency-Key, kept a day so that a retry gets it again. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('idempotency_keys', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    userId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    key: { type: DataTypes.STRING(200), allowNull: false },
    // Method and path the key was first used for: the same key on another request is refused.
    request: { type: DataTypes.STRING, allowNull: false },
    status: { type: DataTypes.INTEGER, allowNull: true },
    body: { type: DataTypes.TEXT, allowNull: true },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('idempotency_keys', ['userId', 'key'], { unique: true });
  await qi.addIndex('idempotency_keys', ['createdAt']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('idempotency_keys');
}
