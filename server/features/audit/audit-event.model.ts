import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { AuditAction, AuditTargetType } from '@shared/schemas/audit';

/** One admin action: who, what, on what, when. Rows are only ever added. */
export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<number>;
  declare actorId: number | null;
  declare action: AuditAction;
  declare targetType: AuditTargetType;
  declare targetId: number;
  declare details: Record<string, unknown>;
  declare createdAt: CreationOptional<Date>;
}

export function initAuditModel(sequelize: Sequelize) {
  AuditEvent.init(
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      actorId: { type: DataTypes.INTEGER, allowNull: true },
      action: { type: DataTypes.STRING, allowNull: false },
      targetType: { type: DataTypes.STRING, allowNull: false },
      targetId: { type: DataTypes.INTEGER, allowNull: false },
      details: { type: DataTypes.JSON, allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'audit_events', updatedAt: false },
  );
}
