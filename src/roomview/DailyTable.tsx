import { DateTime } from 'luxon';
import type { TemperatureUnit } from '../../shared/schemas/common';
import { formatTemperature } from '../charts/displayUnits';
import { QueryResult } from '../ui/QueryResult';
import { Table } from '../ui/Table';
import { useRoomDaily, type DailyExtremes, type TimeRange } from './queries';

type Row = { date: string; logger: DailyExtremes['days'][number]['loggers'][number] | null };

/** The chart's figures as a table: each day's lowest and highest reading per logger, with the time it was taken. */
export function DailyTable({ roomId, roomName, range, unit }: { roomId: number; roomName: string; range: TimeRange; unit: TemperatureUnit }) {
  const daily = useRoomDaily(roomId, range, true);
  return (
    <QueryResult query={daily} loading="Loading the day table…" failed="Could not load the day table">
      {(d) => {
        const time = (iso: string) => DateTime.fromISO(iso, { zone: d.timeZone }).toFormat('HH:mm');
        const day = (date: string) => DateTime.fromISO(date).toFormat('ccc d LLL yyyy');
        // Days without readings show between the first and last day with some (a logger that stopped), not before or after.
        const recorded = d.days.map((x) => x.loggers.length > 0);
        const days = d.days.slice(recorded.indexOf(true), recorded.lastIndexOf(true) + 1);
        const rows = days.flatMap((x): Row[] => (x.loggers.length ? x.loggers.map((logger) => ({ date: x.date, logger })) : [{ date: x.date, logger: null }]));
        if (rows.length === 0) return <p className="text-ink-soft">No readings in this range.</p>;
        return (
          <Table<Row>
            caption={`Daily lowest and highest temperature in ${roomName}, times in ${d.timeZone}`}
            rows={rows}
            rowKey={(r) => `${r.date}-${r.logger?.id ?? 'none'}`}
            columns={[
              { header: 'Day', cell: (r) => day(r.date) },
              { header: 'Logger', cell: (r) => r.logger?.label ?? 'No readings' },
              { header: 'Lowest', cell: (r) => (r.logger ? `${formatTemperature(r.logger.min.c, unit)} at ${time(r.logger.min.t)}` : '—'), figure: true },
              { header: 'Highest', cell: (r) => (r.logger ? `${formatTemperature(r.logger.max.c, unit)} at ${time(r.logger.max.t)}` : '—'), figure: true },
            ]}
          />
        );
      }}
    </QueryResult>
  );
}
