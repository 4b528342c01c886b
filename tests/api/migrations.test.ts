import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes, type Sequelize } from 'sequelize';
import { createMigrator } from '../../server/db/migrator';
import { createSequelize } from '../../server/db/sequelize';
import { migrations } from '../../server/db/migrations';
import { createTestDatabase } from '../support/testDb';

describe('migrations on an empty database', () => {
  let sequelize: Sequelize;
  let drop: () => Promise<void>;
  beforeAll(async () => {
    const db = await createTestDatabase();
    drop = db.drop;
    sequelize = createSequelize(db.url);
  });
  afterAll(async () => {
    await sequelize.close();
    await drop();
  });

  const tables = async () => {
    const rows = (await sequelize.query('SHOW TABLES', { type: QueryTypes.SELECT })) as Record<string, string>[];
    return rows.map((r) => Object.values(r)[0]).filter((n) => n !== 'schema_migrations').sort();
  };

  it('go all the way up, all the way down, and up again', async () => {
    const migrator = createMigrator(sequelize);
    await migrator.up();
    expect((await migrator.executed()).map((m) => m.name)).toEqual(migrations.map((m) => m.name));
    expect(await tables()).toEqual(expect.arrayContaining(['nurseries', 'users', 'rooms', 'loggers', 'logger_placements', 'api_tokens']));
    await migrator.down({ to: 0 });
    expect(await tables()).toEqual([]);
    await migrator.up();
    expect((await migrator.pending()).length).toBe(0);
  });
});
