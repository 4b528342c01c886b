import { ASSOCIATION_CAUTION } from '../../shared/season/findings';
import { describeTake } from '../../shared/season/formatTake';
import type { SeasonReport } from '../../shared/season/seasonReport';

/** The season in a few sentences: overall take, how complete the records are, the strongest differences, the caution. */
export function SeasonSummary({ report }: { report: SeasonReport }) {
  const { counts, overall, findings } = report;
  return (
    <div className="space-y-4">
      <p className="text-lg">
        {overall ? (
          <>
            Overall take: <strong>{describeTake(overall)}</strong>, over {overall.batches} assessed {overall.batches === 1 ? 'batch' : 'batches'}.
          </>
        ) : (
          'No batch of this season has been assessed yet, so there is no take to report.'
        )}
      </p>
      <p className="text-ink-soft">
        {counts.batches} batches ({counts.grafts} grafts) were grafted between {report.from} and {report.to}; {counts.plantedBatches} have been planted
        out ({counts.plantedGrafts} grafts).
        {counts.awaitingAssessment > 0 && ` ${counts.awaitingAssessment} planted batches await their first assessment and are not counted yet.`}
      </p>
      {findings.length > 0 && (
        <div>
          <h3 className="font-semibold text-slate-deep">{findings.some((f) => f.clear) ? 'Strongest differences' : 'Largest difference'}</h3>
          <ul className="mt-2 list-disc space-y-2 pl-5">
            {findings.map((f) => (
              <li key={f.dimension}>{f.text}</li>
            ))}
          </ul>
        </div>
      )}
      <p className="rounded-md border-l-4 border-callus bg-callus-light px-4 py-3">{ASSOCIATION_CAUTION}</p>
    </div>
  );
}
