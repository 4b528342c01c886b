import { DateTime } from 'luxon';

/** How long a stay lasted (or has lasted so far), in days and hours: "12 d 4 h", "3 h", "under an hour". */
export function formatSpan(fromIso: string, toIso: string | null, now: Date = new Date()): string {
  const from = DateTime.fromISO(fromIso);
  const to = toIso ? DateTime.fromISO(toIso) : DateTime.fromJSDate(now);
  const { days, hours } = to.diff(from, ['days', 'hours']).toObject();
  const d = Math.floor(days ?? 0);
  const h = Math.floor(hours ?? 0);
  if (d === 0 && h === 0) return 'under an hour';
  return [d > 0 ? `${d} d` : '', h > 0 ? `${h} h` : ''].filter(Boolean).join(' ');
}
