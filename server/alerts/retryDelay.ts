/**
 * Exponential backoff for SMTP retries: 30 s, 1 min, 2 min, 4 min … capped at 30 min, so a long outage costs a
 * retry every half hour per message and a short one is over within a minute. No jitter: the claim lease already
 * keeps instances from sending the same row, and a handful of rows needs no spreading.
 */
export function retryDelayMs(attempt: number, baseMs = 30_000, capMs = 30 * 60_000): number {
  return Math.min(capMs, baseMs * 2 ** Math.max(0, attempt - 1));
}
