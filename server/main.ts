import { join } from 'node:path';
import { startAlerting } from './alerts/alerting';
import { createApp } from './app';
import { loadConfig } from './config';
import { createMigrator } from './db/migrator';
import { openDatabase } from './db/database';
import { startCaptureServer } from './mail/captureServer';
import { createMailer } from './mail/mailer';
import { seedDemoNursery } from './seed/demoNursery';
import { refreshBlocksAfterImports } from './series/blockUpkeep';

async function main() {
  const config = loadConfig();
  const db = openDatabase(config.databaseUrl);
  const { sequelize } = db;
  await createMigrator(sequelize).up();
  if (config.demo) await seedDemoNursery(sequelize, db.pool);

  // Without SMTP_URL, mail goes to a capture server on loopback and shows on the development inbox page.
  const capture = config.smtpUrl ? null : await startCaptureServer({ dir: config.devMailDir });
  const mailer = createMailer(config.smtpUrl ?? capture!.url, config.mailFrom);
  const { app } = createApp({ config, sequelize, pool: db.pool, mailer, clientDir: join(import.meta.dirname, '..', 'dist') });
  // Chart summaries are brought up to date as part of each import, not on the first chart request after it.
  refreshBlocksAfterImports(db.pool);
  // Alerts: evaluation after imports and every 10 minutes, and the outbox sender; a first round now catches up on
  // whatever happened while the server was down.
  const alerting = startAlerting({ sequelize, pool: db.pool, mailer, appOrigin: config.appOrigin });
  alerting.schedule.tick().catch((err: unknown) => console.error(`alerts: first round failed: ${String(err)}`));

  const server = app.listen(config.port, config.host, () => {
    console.log(`\nColdknit is running at ${config.appOrigin}`);
    if (config.demo) {
      console.log('Demo sign-ins (password coldknit-demo): owner@example.com, staff@example.com, viewer@example.com');
    }
    if (capture) console.log(`E-mail is captured on ${capture.url}; read it at ${config.appOrigin}/dev/mail`);
    console.log('Press Ctrl-C to stop.\n');
  });

  const stop = () => {
    server.close();
    server.closeAllConnections();
    // The sender finishes the message in hand before the mailer and the database close under it.
    void alerting
      .stop()
      .then(() => {
        mailer.close();
        return Promise.all([capture?.close(), db.close()]);
      })
      .then(() => process.exit(0));
  };
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
