import { useNavigate } from 'react-router-dom';
import type { SeasonEntry } from './queries';

/** Chooses the season shown; seasons are grafting years (1 July to 30 June), named by both years. */
export function SeasonPicker({ seasons, season }: { seasons: SeasonEntry[]; season: number }) {
  const navigate = useNavigate();
  const listed = seasons.some((s) => s.season === season) ? seasons : [{ season, label: String(season), current: false, batches: 0, planted: 0, assessed: 0 }, ...seasons];
  return (
    <label className="flex flex-wrap items-center gap-2 font-semibold">
      Season
      <select
        className="min-h-11 w-full max-w-md min-w-0 rounded-md border border-ink-soft/50 bg-white px-3 py-2 text-base font-normal sm:w-auto"
        value={season}
        onChange={(e) => navigate(`/season/${e.target.value}`)}
      >
        {listed.map((s) => (
          <option key={s.season} value={s.season}>
            {s.label}
            {s.current ? ' (this season)' : ''} · {s.assessed}/{s.batches} batches assessed
          </option>
        ))}
      </select>
    </label>
  );
}
