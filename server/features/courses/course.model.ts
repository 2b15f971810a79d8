import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { ProjectCriterion, Skill } from '@shared/schemas/content';

/** Courses, lessons and projects are written in content/ and synced into these tables at start-up. */
export class Course extends Model<InferAttributes<Course>, InferCreationAttributes<Course>> {
  declare id: CreationOptional<number>;
  declare slug: string;
  declare title: string;
  declare summary: string;
  declare level: string;
  declare position: number;
  declare skills: Skill[];
  declare intro: string;
  declare retiredAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class Lesson extends Model<InferAttributes<Lesson>, InferCreationAttributes<Lesson>> {
  declare id: CreationOptional<number>;
  declare courseId: number;
  declare slug: string;
  declare position: number;
  declare title: string;
  declare minutes: number;
  declare skills: string[];
  declare body: string;
  declare retiredAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class Project extends Model<InferAttributes<Project>, InferCreationAttributes<Project>> {
  declare id: CreationOptional<number>;
  declare lessonId: number;
  declare title: string;
  declare brief: string;
  declare passMark: number;
  declare criteria: ProjectCriterion[];
  declare retiredAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true };
const stamps = { createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE };

export function initCourseModels(sequelize: Sequelize) {
  Course.init(
    {
      id,
      slug: { type: DataTypes.STRING, allowNull: false, unique: true },
      title: { type: DataTypes.STRING, allowNull: false },
      summary: { type: DataTypes.TEXT, allowNull: false },
      level: { type: DataTypes.STRING, allowNull: false },
      position: { type: DataTypes.INTEGER, allowNull: false },
      skills: { type: DataTypes.JSON, allowNull: false },
      intro: { type: DataTypes.TEXT, allowNull: false },
      retiredAt: { type: DataTypes.DATE, allowNull: true },
      ...stamps,
    },
    { sequelize, tableName: 'courses' },
  );
  Lesson.init(
    {
      id,
      courseId: { type: DataTypes.INTEGER, allowNull: false },
      slug: { type: DataTypes.STRING, allowNull: false },
      position: { type: DataTypes.INTEGER, allowNull: false },
      title: { type: DataTypes.STRING, allowNull: false },
      minutes: { type: DataTypes.INTEGER, allowNull: false },
      skills: { type: DataTypes.JSON, allowNull: false },
      body: { type: DataTypes.TEXT, allowNull: false },
      retiredAt: { type: DataTypes.DATE, allowNull: true },
      ...stamps,
    },
    { sequelize, tableName: 'lessons' },
  );
  Project.init(
    {
      id,
      lessonId: { type: DataTypes.INTEGER, allowNull: false, unique: true },
      title: { type: DataTypes.STRING, allowNull: false },
      brief: { type: DataTypes.TEXT, allowNull: false },
      passMark: { type: DataTypes.FLOAT, allowNull: false },
      criteria: { type: DataTypes.JSON, allowNull: false },
      retiredAt: { type: DataTypes.DATE, allowNull: true },
      ...stamps,
    },
    { sequelize, tableName: 'projects' },
  );
  Course.hasMany(Lesson, { foreignKey: 'courseId', as: 'lessons' });
  Lesson.belongsTo(Course, { foreignKey: 'courseId', as: 'course' });
  Lesson.hasOne(Project, { foreignKey: 'lessonId', as: 'project' });
  Project.belongsTo(Lesson, { foreignKey: 'lessonId', as: 'lesson' });
}
