import { DataTypes, type QueryInterface } from 'sequelize';

/** Photo uploads, submissions with their versions and photos, reviews with pins, and in-app notifications. */
const timestamps = {
  createdAt: { type: DataTypes.DATE, allowNull: false },
  updatedAt: { type: DataTypes.DATE, allowNull: false },
};
const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true };
const ref = (table: string, onDelete = 'CASCADE') => ({
  type: DataTypes.INTEGER,
  allowNull: false,
  references: { model: table, key: 'id' },
  onDelete,
});

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('uploads', {
    id,
    ownerId: ref('users'),
    /** Random name of the files on disk (DATA_DIR/uploads/<fileKey>-<size>.jpg), never derived from user input. */
    fileKey: { type: DataTypes.STRING, allowNull: false, unique: true },
    width: { type: DataTypes.INTEGER, allowNull: false },
    height: { type: DataTypes.INTEGER, allowNull: false },
    bytes: { type: DataTypes.INTEGER, allowNull: false },
    sourceType: { type: DataTypes.STRING, allowNull: false },
    /** Set once a submission or log entry takes the photo; unclaimed photos are swept after a day. */
    claimedAt: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('uploads', ['ownerId']);
  await qi.addIndex('uploads', ['claimedAt', 'createdAt']);

  await qi.createTable('submissions', {
    id,
    apprenticeId: ref('users'),
    projectId: ref('projects', 'RESTRICT'),
    status: { type: DataTypes.STRING, allowNull: false, defaultValue: 'draft' },
    currentVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    sentAt: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('submissions', ['apprenticeId', 'projectId'], { unique: true });
  await qi.addIndex('submissions', ['status', 'sentAt']);
  await qi.addIndex('submissions', ['status', 'apprenticeId']);
  await qi.addIndex('submissions', ['projectId']);

  await qi.createTable('submission_versions', {
    id,
    submissionId: ref('submissions'),
    number: { type: DataTypes.INTEGER, allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    sentAt: { type: DataTypes.DATE, allowNull: true },
    logEntryIds: { type: DataTypes.JSON, allowNull: false },
    calculationIds: { type: DataTypes.JSON, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('submission_versions', ['submissionId', 'number'], { unique: true });

  await qi.createTable('submission_photos', {
    id,
    versionId: ref('submission_versions'),
    uploadId: ref('uploads', 'RESTRICT'),
    position: { type: DataTypes.INTEGER, allowNull: false },
    caption: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    ...timestamps,
  });
  await qi.addIndex('submission_photos', ['versionId', 'uploadId'], { unique: true });
  await qi.addIndex('submission_photos', ['uploadId']);

  await qi.createTable('reviews', {
    id,
    versionId: { ...ref('submission_versions'), unique: true },
    mentorId: ref('users', 'RESTRICT'),
    scores: { type: DataTypes.JSON, allowNull: false },
    comment: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    weightedScore: { type: DataTypes.FLOAT, allowNull: false },
    outcome: { type: DataTypes.STRING, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('reviews', ['mentorId', 'createdAt']);

  await qi.createTable('pins', {
    id,
    reviewId: ref('reviews'),
    uploadId: ref('uploads', 'RESTRICT'),
    number: { type: DataTypes.INTEGER, allowNull: false },
    x: { type: DataTypes.FLOAT, allowNull: false },
    y: { type: DataTypes.FLOAT, allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('pins', ['reviewId']);
  await qi.addIndex('pins', ['uploadId']);

  await qi.createTable('notifications', {
    id,
    userId: ref('users'),
    kind: { type: DataTypes.STRING, allowNull: false },
    title: { type: DataTypes.STRING, allowNull: false },
    body: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    link: { type: DataTypes.STRING, allowNull: true },
    readAt: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('notifications', ['userId', 'createdAt']);
  await qi.addIndex('notifications', ['userId', 'readAt']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const table of [
    'notifications',
    'pins',
    'reviews',
    'submission_photos',
    'submission_versions',
    'submissions',
    'uploads',
  ]) {
    await qi.dropTable(table);
  }
}
