import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { Outcome } from '@shared/schemas/submission';
import { User } from '../auth/user.model';
import { SubmissionVersion } from '../submissions/submission.model';
import { Upload } from '../uploads/upload.model';

/** A mentor's grading of one version of a submission; at most one per version. */
export class Review extends Model<InferAttributes<Review>, InferCreationAttributes<Review>> {
  declare id: CreationOptional<number>;
  declare versionId: number;
  declare mentorId: number;
  declare scores: Record<string, number>;
  declare comment: string;
  declare weightedScore: number;
  declare outcome: Outcome;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare pins?: NonAttribute<Pin[]>;
  declare mentor?: NonAttribute<User>;
}

/** A numbered note on a point of a photo; x and y are fractions of the photo's width and height. */
export class Pin extends Model<InferAttributes<Pin>, InferCreationAttributes<Pin>> {
  declare id: CreationOptional<number>;
  declare reviewId: number;
  declare uploadId: number;
  declare number: number;
  declare x: number;
  declare y: number;
  declare note: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true };
const stamps = { createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE };

export function initReviewModels(sequelize: Sequelize) {
  Review.init(
    {
      id,
      versionId: { type: DataTypes.INTEGER, allowNull: false, unique: true },
      mentorId: { type: DataTypes.INTEGER, allowNull: false },
      scores: { type: DataTypes.JSON, allowNull: false },
      comment: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      weightedScore: { type: DataTypes.FLOAT, allowNull: false },
      outcome: { type: DataTypes.STRING, allowNull: false },
      ...stamps,
    },
    { sequelize, tableName: 'reviews' },
  );
  Pin.init(
    {
      id,
      reviewId: { type: DataTypes.INTEGER, allowNull: false },
      uploadId: { type: DataTypes.INTEGER, allowNull: false },
      number: { type: DataTypes.INTEGER, allowNull: false },
      x: { type: DataTypes.FLOAT, allowNull: false },
      y: { type: DataTypes.FLOAT, allowNull: false },
      note: { type: DataTypes.TEXT, allowNull: false },
      ...stamps,
    },
    { sequelize, tableName: 'pins' },
  );
  Review.hasMany(Pin, { foreignKey: 'reviewId', as: 'pins' });
  Pin.belongsTo(Review, { foreignKey: 'reviewId', as: 'review' });
  Pin.belongsTo(Upload, { foreignKey: 'uploadId', as: 'upload' });
  Review.belongsTo(User, { foreignKey: 'mentorId', as: 'mentor' });
  Review.belongsTo(SubmissionVersion, { foreignKey: 'versionId', as: 'version' });
  SubmissionVersion.hasOne(Review, { foreignKey: 'versionId', as: 'review' });
}
