import type { Alert } from './alert.model';

/** An alert as the API and the mail templates see it: instants as epoch ms, nothing Sequelize. */
export function toAlertView(a: Alert) {
  return {
    id: a.id,
    rule: a.rule,
    severity: a.severity,
    status: a.status,
    subjectKind: a.subjectKind,
    subjectId: a.subjectId,
    subjectName: a.subjectName,
    roomId: a.roomId,
    since: a.since?.getTime() ?? null,
    openedAt: a.openedAt.getTime(),
    acknowledgedAt: a.acknowledgedAt?.getTime() ?? null,
    acknowledgedBy: a.acknowledgedBy ?? null,
    resolvedAt: a.resolvedAt?.getTime() ?? null,
    resolution: a.resolution ?? null,
    remindersSent: a.remindersSent,
    detail: a.detail,
  };
}

export type AlertView = ReturnType<typeof toAlertView>;
