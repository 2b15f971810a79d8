import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { SubmissionStatus } from '@shared/schemas/submission';
import { User } from '../auth/user.model';
import { Project } from '../courses/course.model';
import { Upload } from '../uploads/upload.model';

/** One apprentice's sending of one project; each sending after rework is a new version. */
export class Submission extends Model<InferAttributes<Submission>, InferCreationAttributes<Submission>> {
  declare id: CreationOptional<number>;
  declare apprenticeId: number;
  declare projectId: number;
  declare status: SubmissionStatus;
  declare currentVersion: CreationOptional<number>;
  declare sentAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare versions?: NonAttribute<SubmissionVersion[]>;
  declare apprentice?: NonAttribute<User>;
  declare project?: NonAttribute<Project>;
}

export class SubmissionVersion extends Model<
  InferAttributes<SubmissionVersion>,
  InferCreationAttributes<SubmissionVersion>
> {
  declare id: CreationOptional<number>;
  declare submissionId: number;
  declare number: number;
  declare notes: string;
  /** Null while the version is a draft. */
  declare sentAt: CreationOptional<Date | null>;
  declare logEntryIds: number[];
  declare calculationIds: number[];
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare photos?: NonAttribute<SubmissionPhoto[]>;
}

export class SubmissionPhoto extends Model<InferAttributes<SubmissionPhoto>, InferCreationAttributes<SubmissionPhoto>> {
  declare id: CreationOptional<number>;
  declare versionId: number;
  declare uploadId: number;
  declare position: number;
  declare caption: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare upload?: NonAttribute<Upload>;
}

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true };
const stamps = { createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE };

export function initSubmissionModels(sequelize: Sequelize) {
  Submission.init(
    {
      id,
      apprenticeId: { type: DataTypes.INTEGER, allowNull: false },
      projectId: { type: DataTypes.INTEGER, allowNull: false },
      status: { type: DataTypes.STRING, allowNull: false, defaultValue: 'draft' },
      currentVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      sentAt: { type: DataTypes.DATE, allowNull: true },
      ...stamps,
    },
    { sequelize, tableName: 'submissions' },
  );
  SubmissionVersion.init(
    {
      id,
      submissionId: { type: DataTypes.INTEGER, allowNull: false },
      number: { type: DataTypes.INTEGER, allowNull: false },
      notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      sentAt: { type: DataTypes.DATE, allowNull: true },
      logEntryIds: { type: DataTypes.JSON, allowNull: false },
      calculationIds: { type: DataTypes.JSON, allowNull: false },
      ...stamps,
    },
    { sequelize, tableName: 'submission_versions' },
  );
  SubmissionPhoto.init(
    {
      id,
      versionId: { type: DataTypes.INTEGER, allowNull: false },
      uploadId: { type: DataTypes.INTEGER, allowNull: false },
      position: { type: DataTypes.INTEGER, allowNull: false },
      caption: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
      ...stamps,
    },
    { sequelize, tableName: 'submission_photos' },
  );
  Submission.hasMany(SubmissionVersion, { foreignKey: 'submissionId', as: 'versions' });
  SubmissionVersion.belongsTo(Submission, { foreignKey: 'submissionId', as: 'submission' });
  SubmissionVersion.hasMany(SubmissionPhoto, { foreignKey: 'versionId', as: 'photos' });
  SubmissionPhoto.belongsTo(SubmissionVersion, { foreignKey: 'versionId', as: 'version' });
  SubmissionPhoto.belongsTo(Upload, { foreignKey: 'uploadId', as: 'upload' });
  Upload.hasMany(SubmissionPhoto, { foreignKey: 'uploadId', as: 'submissionPhotos' });
  Submission.belongsTo(User, { foreignKey: 'apprenticeId', as: 'apprentice' });
  User.hasMany(Submission, { foreignKey: 'apprenticeId', as: 'submissions' });
  Submission.belongsTo(Project, { foreignKey: 'projectId', as: 'project' });
  Project.hasMany(Submission, { foreignKey: 'projectId', as: 'submissions' });
}
