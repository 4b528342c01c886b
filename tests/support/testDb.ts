import { randomBytes } from 'node:crypto';
import mariadb from 'mariadb';

/**
 * A database of its own for one test file, on the throw-away mariadbd that `npm test` starts
 * (COLDKNIT_TEST_DB_URL). Never the development data.
 */
export async function createTestDatabase(): Promise<{ url: string; drop(): Promise<void> }> {
  const base = process.env.COLDKNIT_TEST_DB_URL;
  if (!base) throw new Error('COLDKNIT_TEST_DB_URL is not set: run the tests with `npm test`, which starts a private MariaDB.');
  const u = new URL(base);
  const name = `ck_${randomBytes(5).toString('hex')}`;
  const connect = () =>
    mariadb.createConnection({ host: u.hostname, port: Number(u.port), user: decodeURIComponent(u.username), password: decodeURIComponent(u.password) });
  const conn = await connect();
  await conn.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  await conn.end();
  u.pathname = `/${name}`;
  return {
    url: u.toString(),
    async drop() {
      const c = await connect();
      await c.query(`DROP DATABASE IF EXISTS \`${name}\``);
      await c.end();
    },
  };
}
