// Starts and stops everything that runs in the background for alerts: evaluation after imports, the schedule,
// the outbox sender.
import type { Pool } from 'mariadb';
import type { Sequelize } from 'sequelize';
import type { Mailer } from '../mail/mailer';
import { queueDigestIfDue } from './dailyDigest';
import { createAlertEvaluator, type AlertEvaluator } from './evaluate';
import { afterEachImport } from './importHook';
import { createOutboxSender, type OutboxSender } from './outboxSender';
import { startAlertSchedule, type AlertSchedule } from './scheduler';

export interface AlertingDeps {
  sequelize: Sequelize;
  pool: Pool;
  mailer: Mailer;
  appOrigin: string;
  /** Cron pattern of the evaluation schedule (default every 10 minutes). */
  schedule?: string;
  log?: (message: string) => void;
}

export interface Alerting {
  evaluate: AlertEvaluator;
  sender: OutboxSender;
  schedule: AlertSchedule;
  stop(): Promise<void>;
}

export function startAlerting(deps: AlertingDeps): Alerting {
  const log = deps.log ?? ((m: string) => console.error(m));
  const sender = createOutboxSender({ sequelize: deps.sequelize, mailer: deps.mailer, log });
  const evaluate = createAlertEvaluator({ ...deps, onQueued: () => sender.nudge() });
  const schedule = startAlertSchedule({
    pool: deps.pool,
    evaluate,
    queueDigest: async (nurseryId, now) => {
      if ((await queueDigestIfDue(deps, nurseryId, now)) > 0) sender.nudge();
    },
    pattern: deps.schedule,
    log,
  });
  // An import answers only after this ran, so alerts reflect it; a failure here is logged, never the import's.
  const unhook = afterEachImport(async ({ nurseryId }) => {
    try {
      await evaluate(nurseryId);
    } catch (err) {
      log(`alerts after import (nursery ${nurseryId}): ${err instanceof Error ? err.stack : String(err)}`);
    }
  });
  sender.start();
  return {
    evaluate,
    sender,
    schedule,
    async stop() {
      unhook();
      schedule.stop();
      await sender.stop();
    },
  };
}
