// A second app instance in a process of its own, for alertsDelivery.test.ts: it opens the database, says "ready",
// and on a line from stdin evaluates one nursery and sends the outbox dry, then prints what it did as JSON.
import { once } from 'node:events';
import { createAlertEvaluator } from '../../server/alerts/evaluate';
import { createOutboxSender } from '../../server/alerts/outboxSender';
import { openDatabase } from '../../server/db/database';
import { createMailer } from '../../server/mail/mailer';

const [databaseUrl, smtpUrl, appOrigin, nurseryArg, nowArg] = process.argv.slice(2);
const now = new Date(Number(nowArg));
const db = openDatabase(databaseUrl);
const mailer = createMailer(smtpUrl, 'Coldknit <alerts@coldknit.invalid>');
const evaluate = createAlertEvaluator({ sequelize: db.sequelize, pool: db.pool, appOrigin });
const sender = createOutboxSender({ sequelize: db.sequelize, mailer, clock: () => now, log: () => {} });

process.stdout.write('ready\n');
await once(process.stdin, 'data');
process.stdin.destroy();
const outcome = await evaluate(Number(nurseryArg), now);
let sent = 0;
for (;;) {
  const round = await sender.runOnce();
  sent += round.sent;
  if (round.sent === 0) break;
}
process.stdout.write(`${JSON.stringify({ opened: outcome?.opened.length ?? 0, messages: outcome?.messages ?? 0, sent })}\n`);
mailer.close();
await db.close();
