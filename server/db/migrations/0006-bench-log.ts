import { DataTypes, type QueryInterface } from 'sequelize';

/** The bench log: an apprentice's entries of time, measurements, photos and saved results, and mentors' feedback. */
const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true };
const ref = (table: string, allowNull = false) => ({
  type: DataTypes.INTEGER,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete: allowNull ? 'SET NULL' : 'CASCADE',
});
const createdAt = { type: DataTypes.DATE, allowNull: false };

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('log_entries', {
    id,
    apprenticeId: ref('users'),
    date: { type: DataTypes.DATEONLY, allowNull: false },
    minutes: { type: DataTypes.INTEGER, allowNull: false },
    title: { type: DataTypes.STRING, allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    // A lesson is retired rather than deleted, so SET NULL only guards against a hand-made delete.
    lessonId: ref('lessons', true),
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    editedAt: { type: DataTypes.DATE, allowNull: true },
    createdAt,
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('log_entries', ['apprenticeId', 'date']);

  await qi.createTable('log_measurements', {
    id,
    entryId: ref('log_entries'),
    position: { type: DataTypes.INTEGER, allowNull: false },
    name: { type: DataTypes.STRING, allowNull: false },
    value: { type: DataTypes.REAL, allowNull: false },
    unit: { type: DataTypes.STRING, allowNull: false },
  });
  await qi.addIndex('log_measurements', ['entryId', 'position']);

  await qi.createTable('log_entry_uploads', {
    entryId: { ...ref('log_entries'), primaryKey: true },
    uploadId: { ...ref('uploads'), primaryKey: true },
    position: { type: DataTypes.INTEGER, allowNull: false },
  });

  await qi.createTable('log_entry_calculations', {
    entryId: { ...ref('log_entries'), primaryKey: true },
    calculationId: { ...ref('calculations'), primaryKey: true },
  });

  await qi.createTable('log_comments', {
    id,
    entryId: ref('log_entries'),
    authorId: ref('users'),
    body: { type: DataTypes.TEXT, allowNull: false },
    createdAt,
  });
  await qi.addIndex('log_comments', ['entryId']);

  await qi.createTable('log_grades', {
    id,
    entryId: ref('log_entries'),
    mentorId: ref('users'),
    completeness: { type: DataTypes.INTEGER, allowNull: false },
    measurements: { type: DataTypes.INTEGER, allowNull: false },
    photos: { type: DataTypes.INTEGER, allowNull: false },
    comment: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    entryVersion: { type: DataTypes.INTEGER, allowNull: false },
    createdAt,
  });
  await qi.addIndex('log_grades', ['entryId']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const table of [
    'log_grades',
    'log_comments',
    'log_entry_calculations',
    'log_entry_uploads',
    'log_measurements',
    'log_entries',
  ]) {
    await qi.dropTable(table);
  }
}
