// Every ten minutes (by default): evaluate each nursery and write its digest when due, on one instance at a time.
import { Cron } from 'croner';
import type { Pool } from 'mariadb';
import { Nursery } from '../nurseries/nursery.model';
import { withNamedLock } from './namedLock';

export const DEFAULT_SCHEDULE = '*/10 * * * *';

export interface ScheduleDeps {
  pool: Pool;
  evaluate: (nurseryId: number, now: Date) => Promise<unknown>;
  queueDigest: (nurseryId: number, now: Date) => Promise<unknown>;
  pattern?: string;
  clock?: () => Date;
  log?: (message: string) => void;
}

export interface AlertSchedule {
  /** One tick now; false when another instance holds the tick lock. */
  tick(): Promise<boolean>;
  stop(): void;
}

export function startAlertSchedule(deps: ScheduleDeps): AlertSchedule {
  const clock = deps.clock ?? (() => new Date());
  const log = deps.log ?? ((m: string) => console.error(m));

  // Without waiting (timeout 0): if another instance is ticking, this one skips; the next tick comes soon enough.
  const tick = () =>
    withNamedLock(deps.pool, 'coldknit:alerts:tick', 0, async () => {
      const now = clock();
      for (const { id } of await Nursery.findAll({ attributes: ['id'], order: [['id', 'ASC']] })) {
        try {
          await deps.evaluate(id, now);
          await deps.queueDigest(id, now);
        } catch (err) {
          // One nursery's failure must not starve the others.
          log(`alerts: nursery ${id}: ${err instanceof Error ? err.stack : String(err)}`);
        }
      }
    });

  const job = new Cron(deps.pattern ?? DEFAULT_SCHEDULE, { protect: true, catch: (err) => log(`alerts schedule: ${String(err)}`) }, async () => {
    await tick();
  });
  return { tick, stop: () => job.stop() };
}
