// What the room chart draws, built from the series answer: one line per logger (and its humidity on a right-hand
// axis), species bands behind, the freeze limit as a dashed line, batch moves as marked instants.
import type { ChartData, ChartOptions } from 'chart.js';
import type { AnnotationOptions } from 'chartjs-plugin-annotation';
import { DEFAULT_FREEZE_C } from '../../shared/overview/roomAttention';
import type { TemperatureUnit } from '../../shared/schemas/common';
import { toChartPoints, type ChartPoint } from './chartPoints';
import { formatTemperature, toDisplay, UNIT_SYMBOL } from './displayUnits';
import { BAND_FILL, BAND_TEXT, FREEZE_LINE, GRID_LINE, loggerColour, MOVE_LINE, ZOOM_FILL } from './palette';
import type { RoomSeries } from './seriesTypes';

export type RoomChartData = ChartData<'line', ChartPoint[]>;

const DAY = 86_400_000;

export function roomChartData(series: RoomSeries, unit: TemperatureUnit): RoomChartData {
  const datasets: RoomChartData['datasets'] = [];
  series.loggers.forEach((logger, i) => {
    const colour = loggerColour(i);
    const common = { borderColor: colour, backgroundColor: colour, pointRadius: 0, pointHitRadius: 6, spanGaps: false, normalized: true, parsing: false as const };
    datasets.push({ ...common, label: `${logger.label} ${UNIT_SYMBOL[unit]}`, data: toChartPoints(logger.temperature, (c) => toDisplay(c, unit)), borderWidth: 1.75, yAxisID: 'y' });
    if (logger.humidity) {
      datasets.push({ ...common, label: `${logger.label} % RH`, data: toChartPoints(logger.humidity), borderWidth: 1, borderDash: [4, 3], yAxisID: 'rh' });
    }
  });
  return { datasets };
}

/** The most sensitive stored species sets the line; with none stored, the general limit for unfrozen grafts. */
export function freezeLimitC(series: RoomSeries): number {
  return series.species.length ? Math.max(...series.species.map((s) => s.freezeC)) : DEFAULT_FREEZE_C;
}

function annotations(series: RoomSeries, unit: TemperatureUnit): Record<string, AnnotationOptions> {
  const out: Record<string, AnnotationOptions> = {};
  for (const s of series.species) {
    s.spans.forEach((span, i) => {
      out[`band-${s.key}-${i}`] = {
        type: 'box', drawTime: 'beforeDatasetsDraw', xMin: Date.parse(span.from), xMax: Date.parse(span.to),
        yMin: toDisplay(s.band.minC, unit), yMax: toDisplay(s.band.maxC, unit), backgroundColor: BAND_FILL, borderWidth: 0,
        label: { display: true, content: `${s.name} band`, position: { x: 'start', y: 'start' }, color: BAND_TEXT, font: { size: 11 } },
      };
    });
  }
  const freezeC = freezeLimitC(series);
  out.freeze = {
    type: 'line', drawTime: 'beforeDatasetsDraw', scaleID: 'y', value: toDisplay(freezeC, unit), borderColor: FREEZE_LINE, borderWidth: 1.5, borderDash: [6, 4],
    label: { display: true, content: `Freeze limit ${formatTemperature(freezeC, unit)}`, position: 'end', backgroundColor: FREEZE_LINE, font: { size: 11 } },
  };
  series.moves.forEach((m, i) => {
    out[`move-${i}`] = {
      type: 'line', scaleID: 'x', value: Date.parse(m.t), borderColor: MOVE_LINE, borderWidth: 1, borderDash: [2, 3],
      label: { display: true, content: `${m.code} ${m.direction === 'in' ? 'in' : 'out'}`, position: 'start', backgroundColor: MOVE_LINE, font: { size: 10 } },
    };
  });
  return out;
}

export function roomChartOptions(series: RoomSeries, unit: TemperatureUnit, timeZone: string, onZoom?: (range: { from: number; to: number }) => void): ChartOptions<'line'> {
  const hasHumidity = series.loggers.some((l) => l.humidity);
  // Keep the freeze limit in view even when the room stayed well above it.
  const freeze = toDisplay(freezeLimitC(series), unit);
  return {
    responsive: true,
    maintainAspectRatio: false,
    animation: false,
    interaction: { mode: 'nearest', axis: 'x', intersect: false },
    scales: {
      x: {
        type: 'time',
        min: Date.parse(series.from),
        max: Date.parse(series.to),
        adapters: { date: { zone: timeZone } },
        // Beyond two days, ticks name days (or months) rather than hours that repeat without a date.
        time: {
          tooltipFormat: 'd LLL yyyy, HH:mm',
          minUnit: Date.parse(series.to) - Date.parse(series.from) > 2 * DAY ? 'day' : 'minute',
          displayFormats: { minute: 'HH:mm', hour: 'HH:mm', day: 'd LLL', week: 'd LLL', month: 'LLL yyyy' },
        },
        ticks: { maxRotation: 0, autoSkipPadding: 16 },
        grid: { color: GRID_LINE },
      },
      y: { title: { display: true, text: UNIT_SYMBOL[unit] }, suggestedMin: freeze - 1, grid: { color: GRID_LINE } },
      rh: { display: hasHumidity, position: 'right', min: 0, max: 100, title: { display: true, text: '% RH' }, grid: { drawOnChartArea: false } },
    },
    plugins: {
      legend: { display: series.loggers.length > 1 || hasHumidity, position: 'bottom', labels: { boxHeight: 2 } },
      tooltip: { callbacks: { label: (item) => `${item.dataset.label}: ${(item.parsed.y ?? 0).toFixed(1)}` } },
      annotation: { annotations: annotations(series, unit) },
      zoom: onZoom
        ? { zoom: { drag: { enabled: true, backgroundColor: ZOOM_FILL }, mode: 'x', onZoomComplete: ({ chart }) => onZoom({ from: Math.round(chart.scales.x.min), to: Math.round(chart.scales.x.max) }) } }
        : undefined,
    },
  };
}
