import { Navigate } from 'react-router-dom';
import { seasonLabel } from '../../shared/season/seasonOf';
import { useCurrentSession } from '../auth/useCurrentSession';
import { NotFoundPage } from '../layout/NotFoundPage';
import { ButtonLink, buttonClass } from '../ui/Button';
import { PageHeader } from '../ui/PageHeader';
import { Panel } from '../ui/Panel';
import { QueryResult } from '../ui/QueryResult';
import { Spinner } from '../ui/Spinner';
import { BatchOutcomesTable } from './BatchOutcomesTable';
import { DimensionPanel } from './DimensionPanel';
import { seasonExportUrl, useSeasonReport, useSeasons } from './queries';
import { SeasonComparison } from './SeasonComparison';
import { SeasonPicker } from './SeasonPicker';
import { SeasonSummary } from './SeasonSummary';
import { useSeasonParam } from './useSeasonParam';

/** /season: the latest season with assessed batches, or the current one when none has any. */
export function SeasonIndexPage() {
  const seasons = useSeasons();
  return (
    <QueryResult query={seasons} loading="Loading seasons…" failed="Could not load the seasons">
      {(data) => <Navigate to={`/season/${data.seasons.find((s) => s.assessed > 0)?.season ?? data.current}`} replace />}
    </QueryResult>
  );
}

function SeasonReportView({ season }: { season: number }) {
  const { user } = useCurrentSession();
  const seasons = useSeasons();
  const report = useSeasonReport(season, user.unit);
  const previous = useSeasonReport(season - 1, user.unit);
  const actions = (
    <>
      <a className={buttonClass('secondary')} href={seasonExportUrl(season, user.unit)} download>
        Export CSV
      </a>
      <ButtonLink to={`/season/${season}/print`} variant="secondary">
        Printable report
      </ButtonLink>
    </>
  );
  return (
    <>
      <PageHeader
        title={`Season ${seasonLabel(season)}`}
        description="Take after planting out, set beside what each batch went through in storage. A season is a grafting year: batches grafted from 1 July to 30 June."
        actions={actions}
      />
      {seasons.data && (
        <div className="mb-6">
          <SeasonPicker seasons={seasons.data.seasons} season={season} />
        </div>
      )}
      <QueryResult query={report} loading="Loading the season report…" failed="Could not load the season report">
        {(r) => (
          <div className="space-y-6">
            <Panel title="Summary">
              <SeasonSummary report={r} />
            </Panel>
            {r.dimensions.map((d) => (
              <DimensionPanel key={d.key} dimension={d} />
            ))}
            {previous.isPending ? (
              <Spinner label="Loading the season before…" />
            ) : previous.data && previous.data.overall ? (
              <SeasonComparison current={r} previous={previous.data} />
            ) : null}
            <Panel title="Batches" description="Storage figures are per graft planted, frozen when each part was planted out.">
              <BatchOutcomesTable report={r} />
            </Panel>
          </div>
        )}
      </QueryResult>
    </>
  );
}

export function SeasonReportPage() {
  const season = useSeasonParam();
  return season === null ? <NotFoundPage what="season" /> : <SeasonReportView season={season} />;
}
