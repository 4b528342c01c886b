// Take figures in words: never a percentage without the grafts behind it and its interval.
import type { TakeFigure } from './types';

export const percent = (value: number) => `${Math.round(value)} %`;

/** "92 % (415 of 451 grafts; 95 % interval 89–94 %)" */
export function describeTake(figure: TakeFigure): string {
  return `${percent(figure.takePct)} (${figure.grown} of ${figure.planted} grafts; 95 % interval ${Math.round(figure.lowPct)}–${percent(figure.highPct)})`;
}
