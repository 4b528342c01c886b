const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
const DAY = 24 * HOUR;

/** How long ago, in the words a glance needs: "just now", "14 min ago", "3 h ago", "2 d ago". */
export function formatAge(ageMs: number): string {
  if (ageMs < MINUTE) return 'just now';
  if (ageMs < HOUR) return `${Math.floor(ageMs / MINUTE)} min ago`;
  if (ageMs < 2 * DAY) return `${Math.floor(ageMs / HOUR)} h ago`;
  return `${Math.floor(ageMs / DAY)} d ago`;
}
