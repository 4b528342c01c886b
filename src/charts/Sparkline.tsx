import './registerCharts';
import type { ChartOptions } from 'chart.js';
import { useMemo } from 'react';
import { Line } from 'react-chartjs-2';
import type { PackedLine } from '../../shared/series/packedLine';
import { toChartPoints } from './chartPoints';
import { loggerColour } from './palette';

interface SparklineProps {
  lines: { label: string; temperature: PackedLine }[];
  from: string;
  to: string;
  /** What the drawing shows, for screen readers ("Last 7 days: 1.2 to 5.0 °C"). */
  description: string;
}

const OPTIONS_BASE: ChartOptions<'line'> = {
  responsive: true,
  maintainAspectRatio: false,
  animation: false,
  events: [],
  plugins: { legend: { display: false }, tooltip: { enabled: false } },
};

/** A week at a glance: no axes, no interaction; the numbers around it say what matters. */
export function Sparkline({ lines, from, to, description }: SparklineProps) {
  const data = useMemo(
    () => ({
      datasets: lines.map((l, i) => ({
        label: l.label, data: toChartPoints(l.temperature), borderColor: loggerColour(i), borderWidth: 1.25, pointRadius: 0, spanGaps: false, parsing: false as const, normalized: true,
      })),
    }),
    [lines],
  );
  const options = useMemo<ChartOptions<'line'>>(
    () => ({ ...OPTIONS_BASE, scales: { x: { type: 'time', min: Date.parse(from), max: Date.parse(to), display: false }, y: { display: false } } }),
    [from, to],
  );
  return (
    <div className="h-12 w-full">
      <Line data={data} options={options} role="img" aria-label={description} />
    </div>
  );
}
