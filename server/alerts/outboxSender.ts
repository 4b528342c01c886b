// Delivers the outbox: claim due rows with a lease, send each through the mailer, mark it sent or schedule a retry.
import { randomUUID } from 'node:crypto';
import { hostname } from 'node:os';
import type { Sequelize } from 'sequelize';
import type { Mailer } from '../mail/mailer';
import { claimNext, markAttemptFailed, markSent } from './outboxClaims';
import { retryDelayMs } from './retryDelay';

export interface OutboxSenderOptions {
  sequelize: Sequelize;
  mailer: Mailer;
  clock?: () => Date;
  /** Rows sent per round at most. */
  batchSize?: number;
  /**
   * How long a claim keeps other senders off a row. It must outlast one SMTP conversation: nodemailer gives up on
   * connecting after 2 min and on greeting after 30 s by default, so 15 min leaves a wide margin [DESIGN].
   */
  leaseMs?: number;
  /** How often a started sender looks for due rows when nobody nudges it. */
  pollMs?: number;
  retryDelay?: (attempt: number) => number;
  log?: (message: string) => void;
}

export interface RoundOutcome {
  sent: number;
  retrying: number;
  failed: number;
  lost: number;
}

export interface OutboxSender {
  /** One claim-and-send round; what tests drive with their own clock. */
  runOnce(): Promise<RoundOutcome>;
  start(): void;
  /** Run a round soon (after an evaluation committed messages) instead of waiting for the poll. */
  nudge(): void;
  /** Stops polling and waits for the round in hand, at most `graceMs` (a hung SMTP server must not hold a shutdown). */
  stop(graceMs?: number): Promise<void>;
}

/** 5xx is the receiving server's final answer (no such mailbox, refused): retrying would not change it. */
function isPermanent(err: unknown): boolean {
  const code = (err as { responseCode?: number }).responseCode;
  return typeof code === 'number' && code >= 500 && code < 600;
}

/**
 * Delivery is at least once, and in practice exactly once:
 * - A row is claimed (claimed_by, claimed_until) right before it is sent, so while one sender works on it no other
 *   instance touches it.
 * - The window for a duplicate is between the SMTP server accepting the message and the UPDATE that marks it sent:
 *   if the process dies there, the lease runs out and another sender (or this one after a restart) sends it again.
 *   That resend carries the same Message-ID, fixed when the row was written, so mail systems that de-duplicate by
 *   Message-ID drop it, and a reader sees one message. If the mark-sent UPDATE finds the claim gone (a send that
 *   outlasted the lease), the row may be sent twice; that is logged, and the lease is sized to make it improbable.
 * - Nothing is lost: a failed attempt goes back to pending with an exponential backoff, for as long as the SMTP
 *   server keeps failing; only a permanent (5xx) refusal ends it as `failed`, kept with its error for the owner.
 */
export function createOutboxSender(options: OutboxSenderOptions): OutboxSender {
  const { sequelize, mailer } = options;
  const clock = options.clock ?? (() => new Date());
  const batchSize = options.batchSize ?? 20;
  const leaseMs = options.leaseMs ?? 15 * 60_000;
  const pollMs = options.pollMs ?? 5_000;
  const retryDelay = options.retryDelay ?? retryDelayMs;
  const log = options.log ?? ((m: string) => console.warn(m));
  const instance = `${hostname().slice(0, 30)}:${process.pid}`;

  const until = (now: Date) => new Date(now.getTime() + leaseMs);

  async function runOnce(): Promise<RoundOutcome> {
    const outcome: RoundOutcome = { sent: 0, retrying: 0, failed: 0, lost: 0 };
    for (let i = 0; i < batchSize; i++) {
      const claimant = `${instance}:${randomUUID()}`;
      const row = await claimNext(sequelize, claimant, clock(), until(clock()));
      if (!row) break;
      try {
        await mailer.send({ to: row.toAddress, subject: row.subject, text: row.textBody, html: row.htmlBody, messageId: row.messageId });
      } catch (err) {
        const attempt = row.attempts + 1;
        const permanent = isPermanent(err);
        const retryAt = permanent ? null : new Date(clock().getTime() + retryDelay(attempt));
        await markAttemptFailed(sequelize, row.id, claimant, clock(), err instanceof Error ? err.message : String(err), retryAt);
        if (permanent) outcome.failed++;
        else outcome.retrying++;
        continue;
      }
      if (await markSent(sequelize, row.id, claimant, clock())) outcome.sent++;
      else {
        outcome.lost++;
        log(`outbox ${row.id}: sent, but its claim had run out; another sender may send it again (same Message-ID ${row.messageId})`);
      }
    }
    return outcome;
  }

  let timer: NodeJS.Timeout | null = null;
  let running: Promise<unknown> | null = null;
  let stopped = true;
  let again = false;

  const schedule = (delay: number) => {
    if (stopped) return;
    if (timer) clearTimeout(timer);
    timer = setTimeout(tick, delay);
  };

  function tick() {
    timer = null;
    if (running) {
      again = true;
      return;
    }
    again = false;
    running = runOnce()
      .then((o) => (o.sent === batchSize || again ? 0 : pollMs))
      .catch((err: unknown) => {
        log(`outbox sender: ${err instanceof Error ? err.message : String(err)}`);
        return pollMs;
      })
      .then((delay) => {
        running = null;
        schedule(delay);
      });
  }

  return {
    runOnce,
    start() {
      stopped = false;
      schedule(0);
    },
    nudge() {
      schedule(0);
    },
    async stop(graceMs = 5_000) {
      stopped = true;
      if (timer) clearTimeout(timer);
      timer = null;
      // A row still in hand after the grace keeps its lease and goes out after the next start, same Message-ID.
      let grace: NodeJS.Timeout | undefined;
      await Promise.race([running, new Promise<void>((resolve) => (grace = setTimeout(resolve, graceMs)))]);
      clearTimeout(grace);
    },
  };
}
