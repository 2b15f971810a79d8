import { DataTypes, type QueryInterface } from 'sequelize';

/** Which lessons each apprentice has marked done; rows outlive a lesson's retirement, as lessons are never deleted. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('lesson_progress', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    userId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    lessonId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'lessons', key: 'id' },
      onDelete: 'CASCADE',
    },
    completedAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('lesson_progress', ['userId', 'lessonId'], { unique: true });
  await qi.addIndex('lesson_progress', ['lessonId']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('lesson_progress');
}
