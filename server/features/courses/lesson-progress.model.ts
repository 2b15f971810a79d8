import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One row per lesson an apprentice has marked done; removing the mark deletes the row. */
export class LessonProgress extends Model<InferAttributes<LessonProgress>, InferCreationAttributes<LessonProgress>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare lessonId: number;
  declare completedAt: Date;
}

export function initLessonProgressModel(sequelize: Sequelize) {
  LessonProgress.init(
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      userId: { type: DataTypes.INTEGER, allowNull: false },
      lessonId: { type: DataTypes.INTEGER, allowNull: false },
      completedAt: { type: DataTypes.DATE, allowNull: false },
    },
    { sequelize, tableName: 'lesson_progress', timestamps: false },
  );
}
