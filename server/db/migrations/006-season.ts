import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const ref = (table: string) => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: table, key: 'id' }, onDelete: 'CASCADE' });
const instant = () => ({ type: DataTypes.DATE(3), allowNull: false });
const timestamps = { created_at: instant(), updated_at: instant() };

export async function up(qi: QueryInterface): Promise<void> {
  // One row per part of a batch planted out. The batch's storage figures up to the planting day are frozen into
  // `exposure_snapshot` (plain-text JSON) so a past season's report never depends on recomputing from readings.
  await qi.createTable('plantings', {
    id,
    nursery_id: ref('nurseries'),
    batch_id: ref('batches'),
    planted_on: { type: DataTypes.DATEONLY, allowNull: false },
    graft_count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    location: { type: DataTypes.STRING(120), allowNull: false },
    notes: { type: DataTypes.STRING(1000), allowNull: false, defaultValue: '' },
    exposure_snapshot: { type: DataTypes.TEXT('long'), allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('plantings', ['batch_id', 'planted_on'], { name: 'plantings_batch_day' });
  await qi.addIndex('plantings', ['nursery_id'], { name: 'plantings_nursery' });

  await qi.createTable('take_assessments', {
    id,
    nursery_id: ref('nurseries'),
    batch_id: ref('batches'),
    assessed_on: { type: DataTypes.DATEONLY, allowNull: false },
    grown: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    notes: { type: DataTypes.STRING(1000), allowNull: false, defaultValue: '' },
    ...timestamps,
  });
  await qi.addIndex('take_assessments', ['batch_id', 'assessed_on'], { name: 'take_assessments_batch_day' });
  await qi.addIndex('take_assessments', ['nursery_id'], { name: 'take_assessments_nursery' });
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('take_assessments');
  await qi.dropTable('plantings');
}
