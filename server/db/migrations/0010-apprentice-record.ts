import { DataTypes, type QueryInterface } from 'sequelize';

/** The apprentice's record: skills signed off against evidence, certificates, and the hours a class asks for. */
const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true };
const ref = (table: string, allowNull = false) => ({
  type: DataTypes.INTEGER,
  allowNull,
  references: { model: table, key: 'id' },
  // A sign-off or certificate outlives neither its apprentice nor its course; a signer's account is kept (RESTRICT).
  onDelete: allowNull ? 'SET NULL' : 'CASCADE',
});
const timestamps = {
  createdAt: { type: DataTypes.DATE, allowNull: false },
  updatedAt: { type: DataTypes.DATE, allowNull: false },
};

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('sign_offs', {
    id,
    apprenticeId: ref('users'),
    courseId: ref('courses'),
    skillKey: { type: DataTypes.STRING, allowNull: false },
    mentorId: { ...ref('users'), onDelete: 'RESTRICT' },
    note: { type: DataTypes.TEXT, allowNull: false },
    /** [{ kind, id }]: the pieces, log entries and results the mentor judged, as chosen at the time. */
    evidence: { type: DataTypes.JSON, allowNull: false },
    // A withdrawn sign-off is kept with who withdrew it, when and why.
    withdrawnAt: { type: DataTypes.DATE, allowNull: true },
    withdrawnById: ref('users', true),
    withdrawReason: { type: DataTypes.TEXT, allowNull: true },
    ...timestamps,
  });
  // One standing sign-off per skill; withdrawn ones stay beside it as history.
  await qi.addIndex('sign_offs', ['apprenticeId', 'courseId', 'skillKey'], {
    unique: true,
    where: { withdrawnAt: null },
    name: 'sign_offs_standing',
  });

  await qi.createTable('certificates', {
    id,
    /** Long and random: the public check link carries it, so it must not be guessable. */
    code: { type: DataTypes.STRING(40), allowNull: false, unique: true },
    apprenticeId: ref('users'),
    courseId: ref('courses'),
    issuedById: ref('users', true),
    issuedAt: { type: DataTypes.DATE, allowNull: false },
    revokedAt: { type: DataTypes.DATE, allowNull: true },
    revokedById: ref('users', true),
    revokeReason: { type: DataTypes.TEXT, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('certificates', ['apprenticeId', 'courseId']);

  await qi.addColumn('classes', 'requiredMinutesPerWeek', { type: DataTypes.INTEGER, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('classes', 'requiredMinutesPerWeek');
  await qi.dropTable('certificates');
  await qi.dropTable('sign_offs');
}
