// Take percentages with their intervals: one batch, or grafts pooled over a group of batches.
import type { BatchOutcome, TakeFigure, TakeGroup } from './types';
import { wilsonInterval } from './wilson';

/** A batch counts towards take once it has been planted and assessed at least once. */
export function isAssessed(batch: BatchOutcome): batch is BatchOutcome & { grown: number } {
  return batch.grown !== null && batch.planted > 0;
}

/**
 * Grafts are pooled: the figure is Σ grown ÷ Σ planted over the batches, so a batch of 200 weighs ten times
 * one of 20, as its grafts do. Null when no batch has been assessed.
 */
export function takeFigure(batches: readonly BatchOutcome[]): TakeFigure | null {
  const assessed = batches.filter(isAssessed);
  if (assessed.length === 0) return null;
  const planted = assessed.reduce((sum, b) => sum + b.planted, 0);
  const grown = assessed.reduce((sum, b) => sum + b.grown, 0);
  const interval = wilsonInterval(grown, planted)!;
  return {
    batches: assessed.length,
    planted,
    grown,
    takePct: (100 * grown) / planted,
    lowPct: 100 * interval.low,
    highPct: 100 * interval.high,
  };
}

/** Which group a batch belongs to, or null to leave it out (e.g. no exposure recorded). */
export type GroupOf = (batch: BatchOutcome) => Pick<TakeGroup, 'key' | 'label' | 'catchAll'> | null;

/**
 * Take per group, in the order groups are first met unless `order` (keys) is given; groups with no assessed
 * batch are left out, since a figure of nothing would only clutter the table.
 */
export function takeByGroup(batches: readonly BatchOutcome[], groupOf: GroupOf, order?: readonly string[]): TakeGroup[] {
  const members = new Map<string, { group: Pick<TakeGroup, 'key' | 'label' | 'catchAll'>; batches: BatchOutcome[] }>();
  for (const batch of batches) {
    const group = groupOf(batch);
    if (!group) continue;
    const entry = members.get(group.key) ?? { group, batches: [] };
    entry.batches.push(batch);
    members.set(group.key, entry);
  }
  const keys = order ? order.filter((k) => members.has(k)) : [...members.keys()];
  const groups: TakeGroup[] = [];
  for (const key of keys) {
    const { group, batches: list } = members.get(key)!;
    const figure = takeFigure(list);
    if (figure) groups.push({ ...group, ...figure });
  }
  return groups;
}
