import type { ReactNode } from 'react';
import type { TemperatureUnit } from '../../shared/schemas/common';
import { formatTemperature } from '../charts/displayUnits';
import { Table } from '../ui/Table';
import { hoursText, limitText, rangeText } from './exposureText';
import type { ExposureFigures } from './queries';

export interface ExposureRow {
  key: string;
  /** What the row is about: a room and its dates, or one logger. */
  label: ReactNode;
  figures: ExposureFigures;
  /** Marks the worst-of line that heads a group of logger rows. */
  headline?: boolean;
}

/**
 * One row per stretch of time or per logger, the same columns everywhere: how much was watched, the extremes, and
 * the time and degree-hours beyond each limit of the species profile.
 */
export function ExposureTable({ caption, rows, unit }: { caption: string; rows: ExposureRow[]; unit: TemperatureUnit }) {
  return (
    <Table<ExposureRow>
      caption={caption}
      rows={rows}
      rowKey={(r) => r.key}
      columns={[
        { header: 'Where', cell: (r) => <span className={r.headline ? 'font-semibold' : ''}>{r.label}</span> },
        { header: 'Logged', cell: (r) => `${hoursText(r.figures.hoursCovered)}${r.figures.hoursMissing > 0.05 ? ` (${hoursText(r.figures.hoursMissing)} missing)` : ''}`, figure: true },
        { header: 'Range', cell: (r) => rangeText(r.figures.minC, r.figures.maxC, unit), figure: true },
        { header: 'Mean', cell: (r) => (r.figures.meanC === null ? '—' : formatTemperature(r.figures.meanC, unit)), figure: true },
        { header: 'Below freeze limit', cell: (r) => limitText(r.figures.freeze, unit), figure: true },
        { header: 'Below band', cell: (r) => limitText(r.figures.below, unit), figure: true },
        { header: 'Above band', cell: (r) => limitText(r.figures.above, unit), figure: true },
      ]}
    />
  );
}
