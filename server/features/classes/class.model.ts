import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { EnrolmentStatus } from '@shared/schemas/class';

/** A class of apprentices working through one course under one or more mentors ("class" itself is a keyword). */
export class GuildClass extends Model<InferAttributes<GuildClass>, InferCreationAttributes<GuildClass>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare courseId: number;
  declare startsOn: string;
  declare endsOn: string;
  declare capacity: number;
  /** Bench time the class asks of each apprentice per week; null when it asks for none. */
  declare requiredMinutesPerWeek: CreationOptional<number | null>;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class ClassMentor extends Model<InferAttributes<ClassMentor>, InferCreationAttributes<ClassMentor>> {
  declare classId: number;
  declare userId: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class Enrolment extends Model<InferAttributes<Enrolment>, InferCreationAttributes<Enrolment>> {
  declare id: CreationOptional<number>;
  declare classId: number;
  declare userId: number;
  declare status: CreationOptional<EnrolmentStatus>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

const stamps = { createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE };

export function initClassModels(sequelize: Sequelize) {
  GuildClass.init(
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      name: { type: DataTypes.STRING, allowNull: false },
      courseId: { type: DataTypes.INTEGER, allowNull: false },
      startsOn: { type: DataTypes.DATEONLY, allowNull: false },
      endsOn: { type: DataTypes.DATEONLY, allowNull: false },
      capacity: { type: DataTypes.INTEGER, allowNull: false },
      requiredMinutesPerWeek: { type: DataTypes.INTEGER, allowNull: true },
      archivedAt: { type: DataTypes.DATE, allowNull: true },
      ...stamps,
    },
    { sequelize, tableName: 'classes' },
  );
  ClassMentor.init(
    {
      classId: { type: DataTypes.INTEGER, primaryKey: true },
      userId: { type: DataTypes.INTEGER, primaryKey: true },
      ...stamps,
    },
    { sequelize, tableName: 'class_mentors' },
  );
  Enrolment.init(
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      classId: { type: DataTypes.INTEGER, allowNull: false },
      userId: { type: DataTypes.INTEGER, allowNull: false },
      status: { type: DataTypes.STRING, allowNull: false, defaultValue: 'active' },
      ...stamps,
    },
    { sequelize, tableName: 'enrolments' },
  );
  GuildClass.hasMany(ClassMentor, { foreignKey: 'classId', as: 'mentorLinks' });
  ClassMentor.belongsTo(GuildClass, { foreignKey: 'classId', as: 'class' });
  GuildClass.hasMany(Enrolment, { foreignKey: 'classId', as: 'enrolments' });
  Enrolment.belongsTo(GuildClass, { foreignKey: 'classId', as: 'class' });
}
