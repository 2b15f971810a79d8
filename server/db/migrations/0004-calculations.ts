import { DataTypes, type QueryInterface } from 'sequelize';

/** Saved calculator results: the inputs as the calculator parsed them, and what the server computed from them. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('calculations', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    userId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    calculator: { type: DataTypes.STRING, allowNull: false },
    title: { type: DataTypes.STRING, allowNull: false },
    inputs: { type: DataTypes.JSON, allowNull: false },
    results: { type: DataTypes.JSON, allowNull: false },
    // Kept with the results so that a saved result reads as it did when it was saved, even if a range later moves.
    warnings: { type: DataTypes.JSON, allowNull: false },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('calculations', ['userId', 'createdAt']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('calculations');
}
