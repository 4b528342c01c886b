import { DataTypes, type QueryInterface } from 'sequelize';

export async function up(qi: QueryInterface): Promise<void> {
  // The first and last reading an import actually stored. A nightly re-export spans the whole season but adds one
  // day; chart blocks are rebuilt over this span, not the file's. Null when it stored nothing.
  await qi.addColumn('imports', 'stored_first_at', { type: DataTypes.DATE(3), allowNull: true });
  await qi.addColumn('imports', 'stored_last_at', { type: DataTypes.DATE(3), allowNull: true });
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.removeColumn('imports', 'stored_last_at');
  await qi.removeColumn('imports', 'stored_first_at');
}
