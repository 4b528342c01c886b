import type { PackedLine } from '../../shared/series/packedLine';
import { unpackLine } from '../../shared/series/packedLine';

export interface ChartPoint {
  x: number;
  y: number | null;
}

/** A packed line as chart.js points; nulls stay null so the line breaks there (spanGaps off). */
export function toChartPoints(line: PackedLine, convert: (v: number) => number = (v) => v): ChartPoint[] {
  return unpackLine(line).map((p) => ({ x: p.t, y: p.v === null ? null : convert(p.v) }));
}

/** The lowest and highest point of several lines, with when; null when they hold no value. */
export function extremesOf(lines: readonly PackedLine[]): { low: ChartPoint & { y: number }; high: ChartPoint & { y: number } } | null {
  let low: (ChartPoint & { y: number }) | null = null;
  let high: (ChartPoint & { y: number }) | null = null;
  for (const line of lines) {
    for (const p of toChartPoints(line)) {
      if (p.y === null) continue;
      if (!low || p.y < low.y) low = { x: p.x, y: p.y };
      if (!high || p.y > high.y) high = { x: p.x, y: p.y };
    }
  }
  return low && high ? { low, high } : null;
}
