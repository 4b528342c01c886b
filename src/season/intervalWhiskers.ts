// A chart.js plugin that draws each bar's 95 % interval as a whisker across it, so no bar is read without its
// uncertainty. Chart.js has no error bars of its own; this draws them after the bars from the plugin options.
import type { Chart, Plugin } from 'chart.js';

export interface IntervalWhiskerOptions {
  /** [low, high] per bar of the first dataset, in the value axis' units. */
  intervals: [number, number][];
  color: string;
}

declare module 'chart.js' {
  interface PluginOptionsByType<TType> {
    intervalWhiskers?: IntervalWhiskerOptions;
  }
}

const CAP_HALF_PX = 6;

export const intervalWhiskers: Plugin<'bar'> = {
  id: 'intervalWhiskers',
  afterDatasetsDraw(chart: Chart<'bar'>) {
    // Chart.js hands plugin options over as deep partials, so every part is checked before use.
    const options = chart.options.plugins?.intervalWhiskers;
    if (!options?.intervals) return;
    const meta = chart.getDatasetMeta(0);
    const valueScale = chart.scales.x;
    const { ctx } = chart;
    ctx.save();
    ctx.strokeStyle = options.color ?? 'black';
    ctx.lineWidth = 2;
    meta.data.forEach((bar, i) => {
      const [low, high] = options.intervals?.[i] ?? [];
      if (low === undefined || high === undefined) return;
      const x0 = valueScale.getPixelForValue(low);
      const x1 = valueScale.getPixelForValue(high);
      const y = bar.y;
      ctx.beginPath();
      ctx.moveTo(x0, y);
      ctx.lineTo(x1, y);
      for (const x of [x0, x1]) {
        ctx.moveTo(x, y - CAP_HALF_PX);
        ctx.lineTo(x, y + CAP_HALF_PX);
      }
      ctx.stroke();
    });
    ctx.restore();
  },
};
