// The plain-language summary: the strongest differences in take within each grouping, and how far to trust them.
import { describeTake } from './formatTake';
import type { TakeGroup } from './types';

/**
 * Groups smaller than this are shown in the tables but not singled out in the summary: a single batch is a single
 * storage history, however many grafts it holds.
 */
export const MIN_GRAFTS_FOR_FINDING = 20;
export const MIN_BATCHES_FOR_FINDING = 2;
const MAX_FINDINGS = 4;

export const ASSOCIATION_CAUTION =
  'These are associations in this season\'s records, not proof of cause. Batches differ in several ways at once (the room that ' +
  'froze may also have held the late, weaker wood), and the intervals treat every graft as independent although grafts of one ' +
  'batch shared their storage, so the real uncertainty is wider than shown, most of all for groups made of few batches.';

export interface Finding {
  dimension: string;
  title: string;
  higher: TakeGroup;
  lower: TakeGroup;
  /** Low end of the higher group's interval minus high end of the lower group's, in percentage points. */
  gapPct: number;
  /** The two intervals do not overlap. */
  clear: boolean;
  text: string;
}

interface DimensionGroups {
  key: string;
  title: string;
  groups: TakeGroup[];
}

function compareWithin(d: DimensionGroups): Omit<Finding, 'text'> | null {
  const named = d.groups.filter((g) => !g.catchAll && g.planted >= MIN_GRAFTS_FOR_FINDING && g.batches >= MIN_BATCHES_FOR_FINDING);
  if (named.length < 2) return null;
  const higher = named.reduce((best, g) => (g.takePct > best.takePct ? g : best));
  const lower = named.reduce((worst, g) => (g.takePct < worst.takePct ? g : worst));
  if (higher === lower || higher.takePct === lower.takePct) return null;
  const gapPct = higher.lowPct - lower.highPct;
  return { dimension: d.key, title: d.title, higher, lower, gapPct, clear: gapPct > 0 };
}

function sentence(f: Omit<Finding, 'text'>): string {
  const head = `${f.title}: grafts in “${f.higher.label}” took ${describeTake(f.higher)}, against ${describeTake(f.lower)} in “${f.lower.label}”.`;
  return f.clear
    ? `${head} The intervals do not overlap, so chance alone is an unlikely explanation.`
    : `${head} The intervals overlap, so this difference may well be chance.`;
}

/**
 * For each grouping, its highest and lowest take among groups large enough (see MIN_GRAFTS_FOR_FINDING).
 * Differences whose intervals do not overlap come first, widest gap first, at most MAX_FINDINGS of them;
 * when there is none, the one with the largest difference in take is given, marked as possibly chance.
 */
export function strongestDifferences(dimensions: readonly DimensionGroups[]): Finding[] {
  const candidates = dimensions.map(compareWithin).filter((f): f is Omit<Finding, 'text'> => f !== null);
  const clear = candidates.filter((f) => f.clear).sort((a, b) => b.gapPct - a.gapPct).slice(0, MAX_FINDINGS);
  const chosen = clear.length > 0 ? clear : candidates.sort((a, b) => b.higher.takePct - b.lower.takePct - (a.higher.takePct - a.lower.takePct)).slice(0, 1);
  return chosen.map((f) => ({ ...f, text: sentence(f) }));
}
