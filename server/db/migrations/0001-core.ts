import { DataTypes, type QueryInterface } from 'sequelize';

/** People, courses and classes: the tables every other feature points at. */
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
  await qi.createTable('users', {
    id,
    email: { type: DataTypes.STRING, allowNull: false, unique: true },
    name: { type: DataTypes.STRING, allowNull: false },
    role: { type: DataTypes.STRING, allowNull: false },
    passwordHash: { type: DataTypes.STRING, allowNull: true },
    active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    unitSystem: { type: DataTypes.STRING, allowNull: false, defaultValue: 'metric' },
    ...timestamps,
  });
  await qi.createTable('sessions', {
    sid: { type: DataTypes.STRING, primaryKey: true },
    userId: { type: DataTypes.INTEGER, allowNull: true },
    expires: { type: DataTypes.DATE, allowNull: true },
    data: { type: DataTypes.TEXT, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('sessions', ['userId']);
  await qi.createTable('courses', {
    id,
    slug: { type: DataTypes.STRING, allowNull: false, unique: true },
    title: { type: DataTypes.STRING, allowNull: false },
    summary: { type: DataTypes.TEXT, allowNull: false },
    level: { type: DataTypes.STRING, allowNull: false },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    skills: { type: DataTypes.JSON, allowNull: false },
    intro: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    retiredAt: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.createTable('lessons', {
    id,
    courseId: ref('courses'),
    slug: { type: DataTypes.STRING, allowNull: false },
    position: { type: DataTypes.INTEGER, allowNull: false },
    title: { type: DataTypes.STRING, allowNull: false },
    minutes: { type: DataTypes.INTEGER, allowNull: false },
    skills: { type: DataTypes.JSON, allowNull: false },
    body: { type: DataTypes.TEXT, allowNull: false },
    retiredAt: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('lessons', ['courseId', 'slug'], { unique: true });
  await qi.createTable('projects', {
    id,
    lessonId: { ...ref('lessons'), unique: true },
    title: { type: DataTypes.STRING, allowNull: false },
    brief: { type: DataTypes.TEXT, allowNull: false },
    passMark: { type: DataTypes.FLOAT, allowNull: false },
    criteria: { type: DataTypes.JSON, allowNull: false },
    retiredAt: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.createTable('classes', {
    id,
    name: { type: DataTypes.STRING, allowNull: false },
    courseId: ref('courses', 'RESTRICT'),
    startsOn: { type: DataTypes.DATEONLY, allowNull: false },
    endsOn: { type: DataTypes.DATEONLY, allowNull: false },
    capacity: { type: DataTypes.INTEGER, allowNull: false },
    archivedAt: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.createTable('class_mentors', {
    classId: { ...ref('classes'), primaryKey: true },
    userId: { ...ref('users'), primaryKey: true },
    ...timestamps,
  });
  await qi.createTable('enrolments', {
    id,
    classId: ref('classes'),
    userId: ref('users'),
    status: { type: DataTypes.STRING, allowNull: false, defaultValue: 'active' },
    ...timestamps,
  });
  await qi.addIndex('enrolments', ['classId', 'userId'], { unique: true });
  await qi.addIndex('enrolments', ['userId']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const table of [
    'enrolments',
    'class_mentors',
    'classes',
    'projects',
    'lessons',
    'courses',
    'sessions',
    'users',
  ]) {
    await qi.dropTable(table);
  }
}
