import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { EvidenceRef } from '@shared/schemas/record';

/** A mentor's word that an apprentice has a skill, given against chosen evidence; withdrawn rather than deleted. */
export class SignOff extends Model<InferAttributes<SignOff>, InferCreationAttributes<SignOff>> {
  declare id: CreationOptional<number>;
  declare apprenticeId: number;
  declare courseId: number;
  declare skillKey: string;
  declare mentorId: number;
  declare note: string;
  declare evidence: EvidenceRef[];
  declare withdrawnAt: CreationOptional<Date | null>;
  declare withdrawnById: CreationOptional<number | null>;
  declare withdrawReason: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** The guild's statement that an apprentice finished a course; anyone with the code may check it. */
export class Certificate extends Model<InferAttributes<Certificate>, InferCreationAttributes<Certificate>> {
  declare id: CreationOptional<number>;
  declare code: string;
  declare apprenticeId: number;
  declare courseId: number;
  declare issuedById: number | null;
  declare issuedAt: Date;
  declare revokedAt: CreationOptional<Date | null>;
  declare revokedById: CreationOptional<number | null>;
  declare revokeReason: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

// Functions, not shared objects: Sequelize writes each attribute's name into its definition object.
const id = () => ({ type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true });
const int = (allowNull = false) => ({ type: DataTypes.INTEGER, allowNull });
const stamps = () => ({ createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE });

export function initRecordModels(sequelize: Sequelize) {
  SignOff.init(
    {
      id: id(),
      apprenticeId: int(),
      courseId: int(),
      skillKey: { type: DataTypes.STRING, allowNull: false },
      mentorId: int(),
      note: { type: DataTypes.TEXT, allowNull: false },
      evidence: { type: DataTypes.JSON, allowNull: false },
      withdrawnAt: { type: DataTypes.DATE, allowNull: true },
      withdrawnById: int(true),
      withdrawReason: { type: DataTypes.TEXT, allowNull: true },
      ...stamps(),
    },
    { sequelize, tableName: 'sign_offs' },
  );
  Certificate.init(
    {
      id: id(),
      code: { type: DataTypes.STRING(40), allowNull: false, unique: true },
      apprenticeId: int(),
      courseId: int(),
      issuedById: int(true),
      issuedAt: { type: DataTypes.DATE, allowNull: false },
      revokedAt: { type: DataTypes.DATE, allowNull: true },
      revokedById: int(true),
      revokeReason: { type: DataTypes.TEXT, allowNull: true },
      ...stamps(),
    },
    { sequelize, tableName: 'certificates' },
  );
}
