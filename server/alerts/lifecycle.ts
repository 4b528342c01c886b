// Findings → alert rows: open, keep, escalate, remind, resolve. Runs inside the evaluation's transaction.
import type { Transaction } from 'sequelize';
import { SEVERITY_RANK } from '../../shared/alerts/rules';
import { thresholdsFor, type ThresholdOverrides } from '../../shared/alerts/thresholds';
import type { Finding } from '../../shared/alerts/types';
import { Alert } from './alert.model';

const MS_PER_HOUR = 3_600_000;

export interface LifecycleChanges {
  opened: Alert[];
  /** Open alerts whose severity rose: people who take only critical findings hear of them now. */
  escalated: Alert[];
  reminded: Alert[];
  resolved: Alert[];
  /** Every alert still open (not acknowledged) after this pass, for late subscribers. */
  open: Alert[];
}

const keyOf = (x: { rule: string; subjectKind: string; subjectId: number }) => `${x.rule}:${x.subjectKind}:${x.subjectId}`;

/**
 * Applies one evaluation's findings to the nursery's unresolved alerts (locked FOR UPDATE by the caller's query).
 * - firing, no alert: a new open alert. firing, alert: figures refreshed, severity only ever rises while it lasts.
 * - clear: the alert resolves. settling or unknown: nothing changes but the figures (unknown keeps the old ones).
 * - an unresolved alert with no finding: its subject is no longer watched, so it resolves as such.
 * - an open (unacknowledged) alert last notified a reminder interval ago gets a reminder.
 */
export async function applyFindings(
  transaction: Transaction,
  nurseryId: number,
  unresolved: Alert[],
  findings: readonly Finding[],
  overrides: ThresholdOverrides,
  now: Date,
): Promise<LifecycleChanges> {
  const changes: LifecycleChanges = { opened: [], escalated: [], reminded: [], resolved: [], open: [] };
  const byKey = new Map(unresolved.map((a) => [keyOf(a), a]));
  const seen = new Set<string>();
  const resolve = async (alert: Alert, resolution: 'cleared' | 'unwatched', finding?: Finding) => {
    await alert.update(
      { status: 'resolved', resolvedAt: now, resolution, checkedAt: now, ...(finding && finding.state === 'clear' ? { detail: finding.detail } : {}) },
      { transaction },
    );
    changes.resolved.push(alert);
  };

  for (const f of findings) {
    const key = keyOf(f);
    seen.add(key);
    const alert = byKey.get(key);
    if (!alert) {
      if (f.state !== 'firing') continue;
      const created = await Alert.create(
        {
          nurseryId, rule: f.rule, subjectKind: f.subjectKind, subjectId: f.subjectId, subjectName: f.subjectName, roomId: f.roomId,
          severity: f.severity, status: 'open', since: f.since === null ? null : new Date(f.since), openedAt: now,
          lastNotifiedAt: now, detail: f.detail, checkedAt: now,
        },
        { transaction },
      );
      changes.opened.push(created);
      continue;
    }
    if (f.state === 'clear') {
      await resolve(alert, 'cleared', f);
      continue;
    }
    const rises = f.state === 'firing' && SEVERITY_RANK[f.severity] > SEVERITY_RANK[alert.severity];
    await alert.update(
      {
        subjectName: f.subjectName,
        roomId: f.roomId,
        checkedAt: now,
        ...(f.state === 'unknown' ? {} : { detail: f.detail }),
        ...(rises ? { severity: f.severity } : {}),
      },
      { transaction },
    );
    if (rises) changes.escalated.push(alert);
  }

  for (const alert of unresolved) {
    if (!seen.has(keyOf(alert)) && alert.status !== 'resolved') await resolve(alert, 'unwatched');
  }

  for (const alert of unresolved) {
    if (alert.status !== 'open') continue;
    changes.open.push(alert);
    const interval = thresholdsFor(overrides, alert.roomId).reminderHours * MS_PER_HOUR;
    const last = (alert.lastNotifiedAt ?? alert.openedAt).getTime();
    if (now.getTime() - last >= interval) {
      await alert.update({ lastNotifiedAt: now, remindersSent: alert.remindersSent + 1 }, { transaction });
      changes.reminded.push(alert);
    }
  }
  changes.open.push(...changes.opened);
  return changes;
}
