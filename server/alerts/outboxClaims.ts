// Leases on outbox rows: which sender may deliver a row now, and the bookkeeping after it tried.
import { QueryTypes, type Sequelize } from 'sequelize';
import { OutboxMessage } from './outboxMessage.model';

/**
 * Claims the oldest due row for `claimant` (a token unique to this attempt) until `until`, in one UPDATE: InnoDB
 * locks the row it changes, so two senders (two instances) never claim the same row while its lease runs. A lease
 * that ran out (a sender died mid-send) makes the row claimable again. One row at a time, claimed right before it
 * is sent, so the lease only ever has to cover one SMTP conversation. Null when nothing is due.
 */
export async function claimNext(sequelize: Sequelize, claimant: string, now: Date, until: Date): Promise<OutboxMessage | null> {
  await sequelize.query(
    `UPDATE outbox SET claimed_by = :claimant, claimed_until = :until, updated_at = :now
      WHERE status = 'pending' AND next_attempt_at <= :now AND (claimed_until IS NULL OR claimed_until < :now)
      ORDER BY id LIMIT 1`,
    { replacements: { claimant, until, now }, type: QueryTypes.UPDATE },
  );
  return OutboxMessage.findOne({ where: { claimedBy: claimant, status: 'pending' } });
}

/**
 * Marks a delivered row; false when the claim had been lost meanwhile (the other sender may send it again). The
 * status always changes here, so the affected-row count (changed rows, as Sequelize sets the connector) is exact.
 */
export async function markSent(sequelize: Sequelize, id: number, claimant: string, now: Date): Promise<boolean> {
  const [, affected] = await sequelize.query(
    `UPDATE outbox SET status = 'sent', sent_at = :now, attempts = attempts + 1, claimed_by = NULL, claimed_until = NULL, last_error = NULL, updated_at = :now
      WHERE id = :id AND claimed_by = :claimant AND status = 'pending'`,
    { replacements: { id, claimant, now }, type: QueryTypes.UPDATE },
  );
  return affected === 1;
}

/** Records a failed attempt: back to pending at `retryAt`, or `failed` for good when the server refused outright. */
export async function markAttemptFailed(
  sequelize: Sequelize, id: number, claimant: string, now: Date, error: string, retryAt: Date | null,
): Promise<void> {
  await sequelize.query(
    `UPDATE outbox SET attempts = attempts + 1, last_error = :error, claimed_by = NULL, claimed_until = NULL, updated_at = :now,
            status = IF(:permanent, 'failed', 'pending'), next_attempt_at = COALESCE(:retryAt, next_attempt_at)
      WHERE id = :id AND claimed_by = :claimant AND status = 'pending'`,
    { replacements: { id, claimant, now, error: error.slice(0, 2000), retryAt, permanent: retryAt === null }, type: QueryTypes.UPDATE },
  );
}
