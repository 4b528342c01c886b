// Who hears about which change, grouped into one message per recipient, written to the outbox with the change.
import type { Transaction } from 'sequelize';
import type { Nursery } from '../nurseries/nursery.model';
import type { Alert } from './alert.model';
import { AlertRecipient } from './alertRecipient.model';
import { toAlertView } from './alertView';
import { composeAlertMessage, type Notice } from './mail/alertMessage';
import { enqueueMessages, type OutgoingMessage } from './outboxWriter';
import type { LifecycleChanges } from './lifecycle';
import { admitsRule } from './subscriptionLevels';
import type { Audience } from './subscriptions.service';

/**
 * - An open alert goes, once, to everyone whose subscription admits its rule and severity and who has not been
 *   told yet: at opening, when it escalates to critical for those who take only critical ones, or when someone
 *   subscribes while it is open. Being told is recorded in alert_recipients.
 * - A reminder goes to those already told (and still subscribed); acknowledging stops reminders.
 * - "Resolved" goes to those who were told it opened, unless they have since switched the rule off.
 * Returns the number of messages written.
 */
export async function queueNotices(
  transaction: Transaction,
  nursery: Nursery,
  changes: LifecycleChanges,
  audience: readonly Audience[],
  appOrigin: string,
  now: Date,
): Promise<number> {
  const involved = [...changes.open, ...changes.escalated, ...changes.reminded, ...changes.resolved];
  if (!involved.length || !audience.length) return 0;
  const members = new Map(audience.map((m) => [m.user.id, m]));
  const rows = await AlertRecipient.findAll({ where: { alertId: [...new Set(involved.map((a) => a.id))] }, transaction });
  const told = new Map<number, Set<number>>();
  for (const r of rows) told.set(r.alertId, (told.get(r.alertId) ?? new Set()).add(r.userId));
  const toldOf = (a: Alert) => told.get(a.id) ?? new Set<number>();

  const notices = new Map<number, Notice[]>();
  const add = (userId: number, notice: Notice) => notices.set(userId, [...(notices.get(userId) ?? []), notice]);
  const newlyTold: { alertId: number; userId: number; notifiedAt: Date }[] = [];

  for (const alert of changes.reminded) {
    for (const userId of toldOf(alert)) {
      const m = members.get(userId);
      if (m && admitsRule(m.levels, alert.rule, alert.severity)) add(userId, { kind: 'reminder', alert: toAlertView(alert) });
    }
  }
  for (const alert of new Set([...changes.open, ...changes.escalated])) {
    if (alert.status === 'resolved') continue;
    for (const m of audience) {
      if (toldOf(alert).has(m.user.id) || !admitsRule(m.levels, alert.rule, alert.severity)) continue;
      add(m.user.id, { kind: 'opened', alert: toAlertView(alert) });
      newlyTold.push({ alertId: alert.id, userId: m.user.id, notifiedAt: now });
    }
  }
  for (const alert of changes.resolved) {
    for (const userId of toldOf(alert)) {
      const m = members.get(userId);
      if (m && m.levels[alert.rule] !== 'off') add(userId, { kind: 'resolved', alert: toAlertView(alert) });
    }
  }

  if (newlyTold.length) await AlertRecipient.bulkCreate(newlyTold, { transaction });
  const messages: OutgoingMessage[] = [...notices].map(([userId, list]) => {
    const { user } = members.get(userId)!;
    const content = composeAlertMessage(list, {
      nurseryName: nursery.name,
      recipientName: user.name,
      reader: { unit: user.unit, timeZone: nursery.timeZone },
      appOrigin,
      now: now.getTime(),
    });
    return {
      nurseryId: nursery.id, kind: 'alerts', userId, toAddress: user.email, ...content,
      alertIds: [...new Set(list.map((n) => n.alert.id))],
    };
  });
  await enqueueMessages(transaction, messages, now, appOrigin);
  return messages.length;
}
