import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * The outbox: every e-mail is a row written with the action that causes it and delivered by a background worker.
 * Invitations point at their latest message so that the guild office sees whether it went out.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('outbox_messages', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    to: { type: DataTypes.STRING, allowNull: false },
    subject: { type: DataTypes.STRING, allowNull: false },
    // Emptied once sent when the message carries a one-time link (password reset, invitation).
    text: { type: DataTypes.TEXT, allowNull: false },
    kind: { type: DataTypes.STRING, allowNull: false },
    secret: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    state: { type: DataTypes.STRING, allowNull: false, defaultValue: 'queued' },
    attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    lastError: { type: DataTypes.TEXT, allowNull: true },
    nextAttemptAt: { type: DataTypes.DATE, allowNull: true },
    // Retries stop here (a day after queuing, or after a resend).
    giveUpAt: { type: DataTypes.DATE, allowNull: false },
    // A message whose link has run out is not worth sending.
    expiresAt: { type: DataTypes.DATE, allowNull: true },
    sentAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('outbox_messages', ['state', 'nextAttemptAt']);
  await qi.addIndex('outbox_messages', ['createdAt']);
  await qi.addColumn('invitations', 'mailId', {
    type: DataTypes.INTEGER,
    allowNull: true,
    references: { model: 'outbox_messages', key: 'id' },
    onDelete: 'SET NULL',
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('invitations', 'mailId');
  await qi.dropTable('outbox_messages');
}
