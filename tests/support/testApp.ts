import type { Express } from 'express';
import type { Pool } from 'mariadb';
import type { Sequelize } from 'sequelize';
import request from 'supertest';
import { createApp } from '../../server/app';
import { loadConfig, type AppConfig } from '../../server/config';
import { createMigrator } from '../../server/db/migrator';
import { openDatabase } from '../../server/db/database';
import { startCaptureServer, type CaptureServer } from '../../server/mail/captureServer';
import { createMailer } from '../../server/mail/mailer';
import type { RouteInfo } from '../../server/http/route';
import { seedDemoNursery } from '../../server/seed/demoNursery';
import { createTestDatabase } from './testDb';

export interface TestApp {
  app: Express;
  routes: RouteInfo[];
  sequelize: Sequelize;
  pool: Pool;
  config: AppConfig;
  mail: CaptureServer;
  close(): Promise<void>;
}

export const TEST_ORIGIN = 'http://127.0.0.1:5999';

/** The real app (serving the built client when clientDir is given) on a fresh migrated database with the demo nursery, and a capture SMTP server on loopback. */
export async function startTestApp(options: { seed?: boolean; env?: Record<string, string>; clientDir?: string } = {}): Promise<TestApp> {
  process.env.BCRYPT_COST ??= '10';
  const db = await createTestDatabase();
  const mail = await startCaptureServer();
  const config = loadConfig({ DATABASE_URL: db.url, APP_ORIGIN: TEST_ORIGIN, JWT_SECRET: 'x'.repeat(40), COLDKNIT_DEMO: '1', LOGIN_RATE_LIMIT: '1000', ...options.env });
  const database = openDatabase(db.url);
  const { sequelize, pool } = database;
  await createMigrator(sequelize).up();
  if (options.seed !== false) await seedDemoNursery(sequelize, pool);
  const mailer = createMailer(mail.url, config.mailFrom);
  const { app, routes } = createApp({ config, sequelize, pool, mailer, clientDir: options.clientDir });
  return {
    app,
    routes,
    sequelize,
    pool,
    config,
    mail,
    async close() {
      mailer.close();
      await database.close();
      await mail.close();
      await db.drop();
    },
  };
}

/** A supertest agent that keeps the session cookie, signed in as the given user. */
export async function signIn(app: Express, email: string, password = 'coldknit-demo') {
  const agent = request.agent(app);
  const res = await agent.post('/api/auth/login').send({ email, password });
  if (res.status !== 200) throw new Error(`sign-in as ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return agent;
}
