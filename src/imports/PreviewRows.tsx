import { useCurrentSession } from '../auth/useCurrentSession';
import { formatInstant } from '../time/nurseryTime';
import { formatTemperature } from '../charts/displayUnits';
import type { ImportOutcome } from './queries';

/** The first rows exactly as the reader understood them: the quickest check that dates and units came out right. */
export function PreviewRows({ rows }: { rows: ImportOutcome['preview'] }) {
  const { nursery, user } = useCurrentSession();
  if (rows.length === 0) return null;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm">
        <caption className="mb-1 text-left font-semibold">First rows as read (times in {nursery.timeZone})</caption>
        <thead>
          <tr className="border-b border-frost-deep">
            <th scope="col" className="py-1 pr-3">Line</th>
            <th scope="col" className="py-1 pr-3">Time</th>
            <th scope="col" className="py-1 pr-3">UTC</th>
            <th scope="col" className="py-1 pr-3">Temperature</th>
            <th scope="col" className="py-1">RH</th>
          </tr>
        </thead>
        <tbody className="font-mono">
          {rows.map((r) => (
            <tr key={r.line} className="border-b border-frost">
              <td className="py-1 pr-3">{r.line}</td>
              <td className="py-1 pr-3 whitespace-nowrap">{formatInstant(r.t, nursery.timeZone)}</td>
              <td className="py-1 pr-3 whitespace-nowrap">{r.t.slice(0, 16).replace('T', ' ')}</td>
              <td className="py-1 pr-3">{formatTemperature(r.c, user.unit)}</td>
              <td className="py-1">{r.rh === null ? '—' : `${r.rh} %`}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
