import './registerCharts';
import { useMemo } from 'react';
import { Line } from 'react-chartjs-2';
import type { TemperatureUnit } from '../../shared/schemas/common';
import { roomChartData, roomChartOptions } from './roomChartConfig';
import type { RoomSeries } from './seriesTypes';

interface RoomChartProps {
  series: RoomSeries;
  unit: TemperatureUnit;
  timeZone: string;
  /** Read out in place of the drawing; the figures themselves are in the table beside it. */
  description: string;
  /** Dragging across the chart picks a narrower range; the parent fetches it at full detail. */
  onZoom?: (range: { from: number; to: number }) => void;
}

export function RoomChart({ series, unit, timeZone, description, onZoom }: RoomChartProps) {
  const data = useMemo(() => roomChartData(series, unit), [series, unit]);
  const options = useMemo(() => roomChartOptions(series, unit, timeZone, onZoom), [series, unit, timeZone, onZoom]);
  return (
    <div className="relative h-72 w-full sm:h-96">
      <Line data={data} options={options} role="img" aria-label={description} fallbackContent={<p>{description}</p>} />
    </div>
  );
}
