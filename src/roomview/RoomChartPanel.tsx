import { useCallback, useState } from 'react';
import { useCurrentSession } from '../auth/useCurrentSession';
import { useLoggers, type Logger } from '../loggers/queries';
import { RoomChart } from '../charts/RoomChart';
import { Button } from '../ui/Button';
import { EmptyState } from '../ui/EmptyState';
import { Panel } from '../ui/Panel';
import { QueryResult } from '../ui/QueryResult';
import { describeRoomChart } from './chartDescription';
import { CustomRangeForm } from './CustomRangeForm';
import { DailyTable } from './DailyTable';
import { useRoomSeries, type TimeRange } from './queries';
import { RangePicker, type RangeChoice } from './RangePicker';
import { presetRange, requestWidth } from './rangePresets';
import { useElementWidth } from './useElementWidth';

/** When a logger was first placed in the room, so a season chart does not open on empty months. */
function firstWatched(loggers: Logger[] | undefined, roomId: number): number | null {
  const starts = (loggers ?? []).flatMap((l) => l.placements.filter((p) => p.roomId === roomId).map((p) => Date.parse(p.from)));
  return starts.length ? Math.min(...starts) : null;
}

/**
 * The room's temperature (and humidity) chart with its range choices, drag-to-zoom and a day table for people who
 * cannot use the drawing. Every change of range asks the server again, so a zoomed-in view is drawn from the
 * readings at full detail, not stretched from the overview's points.
 */
export function RoomChartPanel({ roomId, roomName }: { roomId: number; roomName: string }) {
  const { user, nursery } = useCurrentSession();
  const zone = nursery.timeZone;
  const [choice, setChoice] = useState<RangeChoice>('7d');
  const [range, setRange] = useState<TimeRange>(() => presetRange('7d', Date.now(), zone));
  const [showTable, setShowTable] = useState(false);
  const { ref, width } = useElementWidth<HTMLDivElement>();
  const series = useRoomSeries(roomId, range, width ? requestWidth(width, window.devicePixelRatio) : 0);

  const loggers = useLoggers();
  const choose = (next: RangeChoice) => {
    setChoice(next);
    if (next !== 'custom') setRange(presetRange(next, Date.now(), zone, firstWatched(loggers.data, roomId)));
  };
  const zoomTo = useCallback((next: TimeRange) => {
    setChoice('custom');
    setRange(next);
  }, []);

  const tableToggle = (
    <Button variant="secondary" size="sm" aria-expanded={showTable} onClick={() => setShowTable((s) => !s)}>
      {showTable ? 'Hide the day table' : 'Show as table'}
    </Button>
  );
  return (
    <Panel title="Temperature" description={`Times in ${zone}. With a mouse, drag across the chart to look closer.`} actions={tableToggle}>
      <div className="flex flex-col gap-4">
        <RangePicker value={choice} onChange={choose} />
        {choice === 'custom' && <CustomRangeForm key={`${range.from}-${range.to}`} range={range} timeZone={zone} onApply={setRange} />}
        <div ref={ref} className="min-h-72 w-full sm:min-h-96">
          {width > 0 && (
            <QueryResult query={series} loading="Loading the chart…" failed="Could not load the chart">
              {(s) =>
                s.loggers.length === 0 ? (
                  <EmptyState title="No readings in this range">No logger was in this room during the chosen time.</EmptyState>
                ) : (
                  <div aria-busy={series.isFetching}>
                    <RoomChart key={`${s.from}|${s.to}`} series={s} unit={user.unit} timeZone={zone} description={describeRoomChart(s, roomName, user.unit, zone)} onZoom={zoomTo} />
                    {series.isPlaceholderData && <p role="status" className="mt-1 text-sm text-ink-soft">Loading the new range…</p>}
                  </div>
                )
              }
            </QueryResult>
          )}
        </div>
        {showTable && <DailyTable roomId={roomId} roomName={roomName} range={range} unit={user.unit} />}
      </div>
    </Panel>
  );
}
