import { DateTime } from 'luxon';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { seasonLabel } from '../../shared/season/seasonOf';
import type { SeasonReport } from '../../shared/season/seasonReport';
import { useCurrentSession } from '../auth/useCurrentSession';
import { NotFoundPage } from '../layout/NotFoundPage';
import { Button } from '../ui/Button';
import { QueryResult } from '../ui/QueryResult';
import { usePageTitle } from '../ui/usePageTitle';
import { BatchOutcomesTable } from './BatchOutcomesTable';
import { useSeasonReport } from './queries';
import { SeasonComparison } from './SeasonComparison';
import { SeasonSummary } from './SeasonSummary';
import { TakeChart } from './TakeChart';
import { TakeTable } from './TakeTable';
import { useSeasonParam } from './useSeasonParam';
import './print.css';

/** A4 less 12 mm margins each side is 186 mm, about 700 CSS pixels at 96 per inch. */
const PRINT_CHART_WIDTH_PX = 700;

function Section({ title, note, children }: { title: string; note?: string; children: ReactNode }) {
  return (
    <section className="space-y-3 border-t border-frost-deep pt-4">
      <h2 className="text-xl font-bold text-slate-deep">{title}</h2>
      {note && <p className="text-sm text-ink-soft">{note}</p>}
      {children}
    </section>
  );
}

function PrintedReport({ report, previous, nurseryName, zone }: { report: SeasonReport; previous: SeasonReport | undefined; nurseryName: string; zone: string }) {
  return (
    <div className="space-y-6">
      <header>
        <p className="text-sm text-ink-soft">
          {nurseryName} · printed {DateTime.now().setZone(zone).toFormat('d LLL yyyy')}
        </p>
        <h1 className="text-3xl font-bold text-slate-deep">Season {report.label}: take after planting out</h1>
        <p className="text-ink-soft">Batches grafted from {report.from} to {report.to}. Degree-hours in °{report.unit}·h.</p>
      </header>
      <Section title="Summary">
        <SeasonSummary report={report} />
      </Section>
      {report.dimensions
        .filter((d) => d.groups.length > 0)
        .map((d) => (
          <Section key={d.key} title={`Take by ${d.title.toLowerCase()}`} note={d.note}>
            <TakeChart groups={d.groups} title={`Take by ${d.title.toLowerCase()}`} fixedWidth={PRINT_CHART_WIDTH_PX} />
            <TakeTable groups={d.groups} caption={`Take by ${d.title.toLowerCase()}`} />
          </Section>
        ))}
      {previous?.overall && <SeasonComparison current={report} previous={previous} />}
      <Section title="Batches" note="Storage figures are per graft planted, frozen when each part was planted out.">
        <BatchOutcomesTable report={report} linkBatches={false} />
      </Section>
    </div>
  );
}

function SeasonPrintView({ season }: { season: number }) {
  const { user, nursery } = useCurrentSession();
  const report = useSeasonReport(season, user.unit);
  const previous = useSeasonReport(season - 1, user.unit);
  usePageTitle(`Season ${seasonLabel(season)} report`);
  return (
    <div className="season-print mx-auto max-w-4xl bg-white px-6 py-6 print:max-w-none print:p-0">
      <div className="print-hidden mb-6 flex flex-wrap items-center gap-3">
        <Button onClick={() => window.print()}>Print</Button>
        <Link to={`/season/${season}`} className="text-slate underline underline-offset-4">
          Back to the season report
        </Link>
      </div>
      <QueryResult query={report} loading="Loading the season report…" failed="Could not load the season report">
        {(r) => <PrintedReport report={r} previous={previous.data} nurseryName={nursery.name} zone={nursery.timeZone} />}
      </QueryResult>
    </div>
  );
}

/** A page of its own, outside the app frame, laid out for paper: the whole season report with no navigation. */
export function SeasonPrintPage() {
  const season = useSeasonParam();
  return season === null ? <NotFoundPage what="season" /> : <SeasonPrintView season={season} />;
}
