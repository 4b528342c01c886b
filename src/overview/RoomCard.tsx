import { DateTime } from 'luxon';
import { Link } from 'react-router-dom';
import type { TemperatureUnit } from '../../shared/schemas/common';
import { extremesOf } from '../charts/chartPoints';
import { formatTemperature } from '../charts/displayUnits';
import { Sparkline } from '../charts/Sparkline';
import { roomKindLabel } from '../rooms/roomKinds';
import { AttentionBadge } from './AttentionBadge';
import { BatchSummary } from './BatchSummary';
import { LoggerNow } from './LoggerNow';
import type { Overview, OverviewRoom } from './queries';

interface RoomCardProps {
  room: OverviewRoom;
  /** The week every sparkline spans, the same for all rooms. */
  week: Overview['sparkline'];
  unit: TemperatureUnit;
  timeZone: string;
  now: number;
}

const EDGE: Record<OverviewRoom['attention'], string> = { alarm: 'border-l-ember', warn: 'border-l-callus', ok: 'border-l-moss', idle: 'border-l-frost-deep' };

export function RoomCard({ room, week, unit, timeZone, now }: RoomCardProps) {
  const headingId = `room-${room.id}-name`;
  const time = (iso: string) => DateTime.fromISO(iso, { zone: timeZone }).toFormat('HH:mm');
  const { low, high } = room.last24h;
  const weekRange = extremesOf(room.sparkline.map((l) => l.temperature));
  return (
    <article aria-labelledby={headingId} className={`flex flex-col gap-3 rounded-lg border border-l-8 border-frost-deep bg-white p-4 shadow-sm ${EDGE[room.attention]}`}>
      <header className="flex items-start justify-between gap-2">
        <div className="min-w-0">
          <h2 id={headingId} className="text-xl font-bold break-words text-slate-deep">
            <Link to={`/rooms/${room.id}`} className="underline-offset-4 hover:underline">
              {room.name}
            </Link>
          </h2>
          <p className="text-sm text-ink-soft">{roomKindLabel(room.kind)}</p>
        </div>
        <AttentionBadge level={room.attention} />
      </header>

      {room.concerns.length > 0 && (
        <ul className="flex flex-col gap-1">
          {room.concerns.map((c) => (
            <li key={c.message} className={`font-semibold ${c.level === 'alarm' ? 'text-ember' : 'text-ink'}`}>
              {c.message}
            </li>
          ))}
        </ul>
      )}

      {room.loggers.length === 0 ? (
        <p className="text-ink-soft">No logger in this room.</p>
      ) : (
        <div className="flex flex-col gap-1">
          {room.loggers.map((l) => (
            <LoggerNow key={l.id} logger={l} unit={unit} now={now} />
          ))}
        </div>
      )}

      {low && high && (
        <p className="text-sm">
          <span className="font-semibold">Last 24 h:</span> low <span className="font-mono">{formatTemperature(low.c, unit)}</span> at {time(low.t)} ({low.logger}), high{' '}
          <span className="font-mono">{formatTemperature(high.c, unit)}</span> at {time(high.t)} ({high.logger})
        </p>
      )}

      {weekRange && (
        <Sparkline
          lines={room.sparkline}
          from={week.from}
          to={week.to}
          description={`${room.name}, last 7 days: from ${formatTemperature(weekRange.low.y, unit)} to ${formatTemperature(weekRange.high.y, unit)}.`}
        />
      )}

      {room.batches.length > 0 && (
        <section aria-label={`Batches in ${room.name}`}>
          <h3 className="font-semibold">
            {room.batches.length} {room.batches.length === 1 ? 'batch' : 'batches'} stored here
          </h3>
          <ul className="mt-1 flex flex-col gap-2">
            {room.batches.map((b) => (
              <BatchSummary key={b.id} batch={b} unit={unit} timeZone={timeZone} />
            ))}
          </ul>
        </section>
      )}
    </article>
  );
}
