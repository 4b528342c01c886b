import { BarElement, CategoryScale, Chart as ChartJS, LinearScale, Tooltip } from 'chart.js';
import { Bar } from 'react-chartjs-2';
import { describeTake } from '../../shared/season/formatTake';
import type { TakeGroup } from '../../shared/season/types';
import { intervalWhiskers } from './intervalWhiskers';

ChartJS.register(BarElement, CategoryScale, LinearScale, Tooltip, intervalWhiskers);

// Palette from tailwind.config.ts: moss bars for take, ink whiskers for the interval, leftover groups in frost.
const MOSS = '#35684f';
const FROST_DEEP = '#a9c6d3';
const INK = '#1c2630';

/**
 * Take % per group as horizontal bars with their 95 % interval drawn across each. The table beside it carries the
 * same figures for screen readers, so the canvas is described in one sentence only. `fixedWidth` draws at one size
 * for paper: a responsive canvas keeps its screen width when the browser lays the page out for printing.
 */
export function TakeChart({ groups, title, fixedWidth }: { groups: TakeGroup[]; title: string; fixedWidth?: number }) {
  const height = 48 + groups.length * 34;
  return (
    <div style={{ height, width: fixedWidth }} className="w-full break-inside-avoid">
      <Bar
        width={fixedWidth}
        height={fixedWidth && height}
        role="img"
        aria-label={`${title}: take in percent with 95 % intervals, ${groups.length} groups; the table below gives the figures.`}
        data={{
          labels: groups.map((g) => g.label),
          datasets: [{ data: groups.map((g) => g.takePct), backgroundColor: groups.map((g) => (g.catchAll ? FROST_DEEP : MOSS)), barPercentage: 0.7 }],
        }}
        options={{
          indexAxis: 'y',
          responsive: !fixedWidth,
          maintainAspectRatio: false,
          animation: false,
          devicePixelRatio: Math.max(2, window.devicePixelRatio),
          scales: {
            x: { min: 0, max: 100, title: { display: true, text: 'Take (%) with 95 % interval' }, ticks: { color: INK } },
            y: { ticks: { color: INK, autoSkip: false } },
          },
          plugins: {
            legend: { display: false },
            tooltip: { callbacks: { label: (item) => describeTake(groups[item.dataIndex]) } },
            intervalWhiskers: { intervals: groups.map((g) => [g.lowPct, g.highPct]), color: INK },
          },
        }}
      />
    </div>
  );
}
