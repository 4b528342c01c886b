import { randomUUID } from 'node:crypto';
import type { Transaction } from 'sequelize';
import { OutboxMessage, type OutboxKind } from './outboxMessage.model';

export interface OutgoingMessage {
  nurseryId: number;
  kind: OutboxKind;
  userId: number;
  toAddress: string;
  subject: string;
  text: string;
  html: string;
  alertIds: number[];
}

/**
 * Writes messages to the outbox inside the caller's transaction: they exist exactly when the change they report
 * was committed. Each gets its Message-ID now, so however many times the sender has to try, every attempt is the
 * same message to the receiving side.
 */
export async function enqueueMessages(transaction: Transaction, messages: readonly OutgoingMessage[], now: Date, appOrigin: string): Promise<void> {
  if (!messages.length) return;
  const host = new URL(appOrigin).hostname || 'coldknit.invalid';
  await OutboxMessage.bulkCreate(
    messages.map((m) => ({
      nurseryId: m.nurseryId,
      kind: m.kind,
      userId: m.userId,
      toAddress: m.toAddress,
      subject: m.subject,
      textBody: m.text,
      htmlBody: m.html,
      alertIds: m.alertIds,
      messageId: `<outbox.${randomUUID()}@${host}>`,
      nextAttemptAt: now,
    })),
    { transaction },
  );
}
