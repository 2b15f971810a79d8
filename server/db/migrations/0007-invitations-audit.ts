import { DataTypes, type QueryInterface } from 'sequelize';

/** Invitations to join a class (token kept only as a hash) and the audit log of admin actions. */
const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true };

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('invitations', {
    id,
    classId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'classes', key: 'id' },
      onDelete: 'CASCADE',
    },
    email: { type: DataTypes.STRING, allowNull: false },
    name: { type: DataTypes.STRING, allowNull: true },
    tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expiresAt: { type: DataTypes.DATE, allowNull: false },
    acceptedAt: { type: DataTypes.DATE, allowNull: true },
    revokedAt: { type: DataTypes.DATE, allowNull: true },
    invitedById: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('invitations', ['classId', 'email']);
  await qi.addIndex('invitations', ['email']);

  await qi.createTable('audit_events', {
    id,
    // Kept when the actor's account is gone, so the record still says that someone acted.
    actorId: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    action: { type: DataTypes.STRING, allowNull: false },
    targetType: { type: DataTypes.STRING, allowNull: false },
    targetId: { type: DataTypes.INTEGER, allowNull: false },
    details: { type: DataTypes.JSON, allowNull: false },
    createdAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('audit_events', ['createdAt']);
  await qi.addIndex('audit_events', ['actorId']);
  await qi.addIndex('audit_events', ['action']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('audit_events');
  await qi.dropTable('invitations');
}
