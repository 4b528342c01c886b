/** Small formatters shared by the human-readable output of commands. */

/** Epoch ms → "2025-01-13T00:00:00Z" (ISO 8601, UTC, milliseconds only when present). */
export function isoUtc(ms: number | null): string | null {
  if (ms === null) return null;
  const iso = new Date(ms).toISOString();
  return iso.endsWith('.000Z') ? `${iso.slice(0, -5)}Z` : iso;
}

export function celsius(value: number | null, digits = 1): string {
  return value === null ? '–' : `${value.toFixed(digits)} °C`;
}

export function hours(value: number): string {
  return `${value.toFixed(1)} h`;
}

/** 265500000 → "3 d 1 h 45 min". */
export function duration(ms: number): string {
  const minutes = Math.round(ms / 60_000);
  const days = Math.floor(minutes / 1440);
  const h = Math.floor((minutes % 1440) / 60);
  const min = minutes % 60;
  const parts = [days ? `${days} d` : '', h ? `${h} h` : '', min ? `${min} min` : ''].filter(Boolean);
  return parts.length > 0 ? parts.join(' ') : '0 min';
}

export function plural(count: number, one: string, many = `${one}s`): string {
  return `${count} ${count === 1 ? one : many}`;
}
