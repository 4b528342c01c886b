import { Op, type Sequelize, type WhereOptions } from 'sequelize';
import type { z } from 'zod';
import type { alertListQuery } from '../../shared/schemas/alerts';
import { conflict, notFound } from '../http/errors';
import { User } from '../users/user.model';
import { Alert } from './alert.model';
import { toAlertView } from './alertView';

async function withNames(nurseryId: number, alerts: Alert[]) {
  const ids = [...new Set(alerts.map((a) => a.acknowledgedBy).filter((id): id is number => id !== null))];
  const users = ids.length ? await User.findAll({ where: { nurseryId, id: ids }, attributes: ['id', 'name'] }) : [];
  const names = new Map(users.map((u) => [u.id, u.name]));
  return alerts.map((a) => ({ ...toAlertView(a), acknowledgedByName: a.acknowledgedBy ? (names.get(a.acknowledgedBy) ?? null) : null }));
}

/** Newest first; `before` pages back through the history. A room's history is this list filtered by roomId. */
export async function listAlerts(nurseryId: number, query: z.output<typeof alertListQuery>) {
  const where: WhereOptions<Alert> = { nurseryId };
  if (query.status) Object.assign(where, { status: query.status });
  if (query.rule) Object.assign(where, { rule: query.rule });
  if (query.severity) Object.assign(where, { severity: query.severity });
  if (query.roomId) Object.assign(where, { roomId: query.roomId });
  if (query.before) Object.assign(where, { id: { [Op.lt]: query.before } });
  const rows = await Alert.findAll({ where, order: [['id', 'DESC']], limit: query.limit + 1 });
  const page = rows.slice(0, query.limit);
  return { alerts: await withNames(nurseryId, page), nextBefore: rows.length > query.limit ? page.at(-1)!.id : null };
}

/** The navigation's count: alerts nobody has acknowledged yet. */
export async function alertSummary(nurseryId: number) {
  return { open: await Alert.count({ where: { nurseryId, status: 'open' } }) };
}

async function findAlert(nurseryId: number, id: number) {
  const alert = await Alert.findOne({ where: { id, nurseryId } });
  if (!alert) throw notFound('That alert');
  return alert;
}

export async function getAlert(nurseryId: number, id: number) {
  return (await withNames(nurseryId, [await findAlert(nurseryId, id)]))[0];
}

/**
 * Stops the reminders; the alert stays until its condition clears. Acknowledging twice is harmless (the first
 * name and time stay). The row is locked so an evaluation running at the same moment sees one state or the other.
 */
export async function acknowledgeAlert(sequelize: Sequelize, nurseryId: number, id: number, userId: number | null, now = new Date()) {
  await sequelize.transaction(async (transaction) => {
    const alert = await Alert.findOne({ where: { id, nurseryId }, lock: transaction.LOCK.UPDATE, transaction });
    if (!alert) throw notFound('That alert');
    if (alert.status === 'resolved') throw conflict('alert_resolved', 'This alert has already ended; there is nothing to acknowledge.');
    if (alert.status === 'open') await alert.update({ status: 'acknowledged', acknowledgedAt: now, acknowledgedBy: userId }, { transaction });
  });
  return getAlert(nurseryId, id);
}
