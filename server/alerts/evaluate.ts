// evaluate(nurseryId, now): the one entry point the import hook and the scheduler share.
import type { Pool } from 'mariadb';
import type { Sequelize } from 'sequelize';
import { evaluateNursery } from '../../shared/alerts/evaluateNursery';
import { Nursery } from '../nurseries/nursery.model';
import { Alert } from './alert.model';
import { applyFindings } from './lifecycle';
import { withNamedLock } from './namedLock';
import { queueNotices } from './notify';
import { loadOverrides } from './settings.service';
import { loadSnapshot } from './snapshot';
import { loadAudience } from './subscriptions.service';

export interface EvaluationOutcome {
  nurseryId: number;
  findings: number;
  opened: number[];
  reminded: number[];
  resolved: number[];
  messages: number;
}

export interface AlertEvaluatorDeps {
  sequelize: Sequelize;
  pool: Pool;
  appOrigin: string;
  /** Told when messages were committed to the outbox, so the sender can go at once instead of at its next poll. */
  onQueued?: () => void;
}

export type AlertEvaluator = (nurseryId: number, now?: Date) => Promise<EvaluationOutcome | null>;

/** How long an evaluation waits for another instance's evaluation of the same nursery before giving up. */
const LOCK_WAIT_SECONDS = 60;

export function createAlertEvaluator(deps: AlertEvaluatorDeps): AlertEvaluator {
  const { sequelize, pool, appOrigin } = deps;

  async function evaluateLocked(nurseryId: number, now: Date): Promise<EvaluationOutcome | null> {
    const nursery = await Nursery.findByPk(nurseryId);
    if (!nursery) return null;
    const overrides = await loadOverrides(nurseryId);
    const snapshot = await loadSnapshot(pool, nurseryId, overrides, now.getTime());
    const findings = evaluateNursery(snapshot, overrides, now.getTime());
    const audience = await loadAudience(nurseryId);
    return sequelize.transaction(async (transaction) => {
      const unresolved = await Alert.findAll({
        where: { nurseryId, status: ['open', 'acknowledged'] },
        lock: transaction.LOCK.UPDATE,
        transaction,
      });
      const changes = await applyFindings(transaction, nurseryId, unresolved, findings, overrides, now);
      const messages = await queueNotices(transaction, nursery, changes, audience, appOrigin, now);
      return {
        nurseryId,
        findings: findings.length,
        opened: changes.opened.map((a) => a.id),
        reminded: changes.reminded.map((a) => a.id),
        resolved: changes.resolved.map((a) => a.id),
        messages,
      };
    });
  }

  /**
   * Serialised per nursery across instances (GET_LOCK): two evaluations at once would both see "no open alert"
   * and both try to open one; the alerts table's unique open key would refuse the second, but only after the
   * work was done twice. Null when the nursery does not exist or the lock could not be had.
   */
  return async (nurseryId, now = new Date()) => {
    let outcome: EvaluationOutcome | null = null;
    await withNamedLock(pool, `coldknit:alerts:evaluate:${nurseryId}`, LOCK_WAIT_SECONDS, async () => {
      outcome = await evaluateLocked(nurseryId, now);
    });
    const done = outcome as EvaluationOutcome | null;
    if (done && done.messages > 0) deps.onQueued?.();
    return done;
  };
}
