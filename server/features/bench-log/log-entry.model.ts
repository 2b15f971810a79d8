import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One sitting at the bench: how long, what was done, and what was measured. */
export class LogEntry extends Model<InferAttributes<LogEntry>, InferCreationAttributes<LogEntry>> {
  declare id: CreationOptional<number>;
  declare apprenticeId: number;
  /** YYYY-MM-DD. */
  declare date: string;
  declare minutes: number;
  declare title: string;
  declare notes: string;
  declare lessonId: number | null;
  declare version: CreationOptional<number>;
  declare editedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class LogMeasurement extends Model<InferAttributes<LogMeasurement>, InferCreationAttributes<LogMeasurement>> {
  declare id: CreationOptional<number>;
  declare entryId: number;
  declare position: number;
  declare name: string;
  declare value: number;
  declare unit: string;
}

export class LogEntryUpload extends Model<InferAttributes<LogEntryUpload>, InferCreationAttributes<LogEntryUpload>> {
  declare entryId: number;
  declare uploadId: number;
  declare position: number;
}

export class LogEntryCalculation extends Model<
  InferAttributes<LogEntryCalculation>,
  InferCreationAttributes<LogEntryCalculation>
> {
  declare entryId: number;
  declare calculationId: number;
}

export class LogComment extends Model<InferAttributes<LogComment>, InferCreationAttributes<LogComment>> {
  declare id: CreationOptional<number>;
  declare entryId: number;
  declare authorId: number;
  declare body: string;
  declare createdAt: CreationOptional<Date>;
}

export class LogGrade extends Model<InferAttributes<LogGrade>, InferCreationAttributes<LogGrade>> {
  declare id: CreationOptional<number>;
  declare entryId: number;
  declare mentorId: number;
  declare completeness: number;
  declare measurements: number;
  declare photos: number;
  declare comment: string;
  declare entryVersion: number;
  declare createdAt: CreationOptional<Date>;
}

// Functions, not shared objects: Sequelize writes each attribute's name into its definition object.
const id = () => ({ type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true });
const int = () => ({ type: DataTypes.INTEGER, allowNull: false });
const text = () => ({ type: DataTypes.TEXT, allowNull: false });
const createdOnly = { timestamps: true, updatedAt: false } as const;

export function initBenchLogModels(sequelize: Sequelize) {
  LogEntry.init(
    {
      id: id(),
      apprenticeId: int(),
      date: { type: DataTypes.DATEONLY, allowNull: false },
      minutes: int(),
      title: { type: DataTypes.STRING, allowNull: false },
      notes: text(),
      lessonId: { type: DataTypes.INTEGER, allowNull: true },
      version: { ...int(), defaultValue: 1 },
      editedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'log_entries' },
  );
  LogMeasurement.init(
    {
      id: id(),
      entryId: int(),
      position: int(),
      name: { type: DataTypes.STRING, allowNull: false },
      value: { type: DataTypes.REAL, allowNull: false },
      unit: { type: DataTypes.STRING, allowNull: false },
    },
    { sequelize, tableName: 'log_measurements', timestamps: false },
  );
  LogEntryUpload.init(
    { entryId: { ...int(), primaryKey: true }, uploadId: { ...int(), primaryKey: true }, position: int() },
    { sequelize, tableName: 'log_entry_uploads', timestamps: false },
  );
  LogEntryCalculation.init(
    { entryId: { ...int(), primaryKey: true }, calculationId: { ...int(), primaryKey: true } },
    { sequelize, tableName: 'log_entry_calculations', timestamps: false },
  );
  LogComment.init(
    { id: id(), entryId: int(), authorId: int(), body: text(), createdAt: DataTypes.DATE },
    { sequelize, tableName: 'log_comments', ...createdOnly },
  );
  LogGrade.init(
    {
      id: id(),
      entryId: int(),
      mentorId: int(),
      completeness: int(),
      measurements: int(),
      photos: int(),
      comment: text(),
      entryVersion: int(),
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'log_grades', ...createdOnly },
  );
}
