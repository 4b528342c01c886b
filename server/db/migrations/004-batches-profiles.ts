import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const ref = (table: string, onDelete: 'CASCADE' | 'RESTRICT') => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull: false,
  references: { model: table, key: 'id' },
  onDelete,
});
const instant = (allowNull = false) => ({ type: DataTypes.DATE(3), allowNull });
const celsius = (allowNull = false) => ({ type: DataTypes.DOUBLE, allowNull });
const timestamps = { created_at: instant(), updated_at: instant() };

export async function up(qi: QueryInterface): Promise<void> {
  // A nursery's own profiles, copied from a built-in one (or another copy) and edited. Numbers are DOUBLE so a
  // built-in value such as 45 °F = 7.222… °C is copied exactly.
  await qi.createTable('species_profiles', {
    id,
    nursery_id: ref('nurseries', 'CASCADE'),
    key: { type: DataTypes.STRING(40), allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    based_on: { type: DataTypes.STRING(40), allowNull: false },
    freeze_c: celsius(),
    band_min_c: celsius(),
    band_max_c: celsius(),
    storage_max_c: celsius(true),
    callus_base_c: celsius(),
    callus_opt_low_c: celsius(),
    callus_opt_high_c: celsius(),
    callus_upper_c: celsius(),
    callus_hours_at_optimum: celsius(),
    sources: { type: DataTypes.TEXT('long'), allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('species_profiles', ['nursery_id', 'key'], { unique: true, name: 'species_profiles_nursery_key' });

  await qi.createTable('batches', {
    id,
    nursery_id: ref('nurseries', 'CASCADE'),
    code: { type: DataTypes.STRING(40), allowNull: false },
    // A built-in profile key or one of the nursery's species_profiles keys; checked by the service.
    species_key: { type: DataTypes.STRING(40), allowNull: false },
    scion_cultivar: { type: DataTypes.STRING(120), allowNull: false },
    rootstock: { type: DataTypes.STRING(120), allowNull: false },
    method: { type: DataTypes.STRING(60), allowNull: false },
    graft_count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    grafted_on: { type: DataTypes.DATEONLY, allowNull: false },
    grafter: { type: DataTypes.STRING(120), allowNull: false },
    storage_medium: { type: DataTypes.STRING(80), allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false },
    status: { type: DataTypes.ENUM('in_storage', 'planted_out', 'discarded'), allowNull: false },
    left_at: instant(true),
    left_note: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
    ...timestamps,
  });
  await qi.addIndex('batches', ['nursery_id', 'code'], { unique: true, name: 'batches_nursery_code' });
  await qi.addIndex('batches', ['nursery_id', 'status', 'grafted_on'], { name: 'batches_nursery_status' });
  await qi.addIndex('batches', ['nursery_id', 'species_key'], { name: 'batches_nursery_species' });

  await qi.createTable('batch_placements', {
    id,
    batch_id: ref('batches', 'CASCADE'),
    room_id: ref('rooms', 'RESTRICT'),
    placed_from: instant(),
    placed_to: instant(true),
    ...timestamps,
  });
  await qi.addIndex('batch_placements', ['batch_id', 'placed_from'], { name: 'batch_placements_batch_from' });
  await qi.addIndex('batch_placements', ['room_id', 'placed_from'], { name: 'batch_placements_room_from' });

  // Computed exposure per batch. `stamp` digests the small inputs (placements, logger placements of its rooms,
  // profile version); readings invalidate by deleting rows. Payloads are plain text JSON: no per-row JSON check.
  await qi.createTable('batch_exposure_cache', {
    batch_id: { ...ref('batches', 'CASCADE'), primaryKey: true },
    nursery_id: ref('nurseries', 'CASCADE'),
    stamp: { type: DataTypes.CHAR(40), allowNull: false },
    computed_at: instant(),
    // After this instant the figures must be recomputed (a placement boundary or reading lies ahead of computed_at).
    valid_until: instant(true),
    summary: { type: DataTypes.TEXT('long'), allowNull: false },
    detail: { type: DataTypes.TEXT('long'), allowNull: false },
  });
  await qi.addIndex('batch_exposure_cache', ['nursery_id'], { name: 'batch_exposure_cache_nursery' });
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const table of ['batch_exposure_cache', 'batch_placements', 'batches', 'species_profiles']) await qi.dropTable(table);
}
