import { describeTake } from '../../shared/season/formatTake';
import { useRoleAtLeast } from '../auth/useCurrentSession';
import { ConfirmAction } from '../ui/ConfirmAction';
import { Panel } from '../ui/Panel';
import { QueryResult } from '../ui/QueryResult';
import { Table, type Column } from '../ui/Table';
import { AssessmentForm } from './AssessmentForm';
import { PlantingForm } from './PlantingForm';
import { useBatchOutcome, useDeleteRecord, type AssessmentRecord, type BatchOutcomeView, type PlantingRecord } from './queries';

const hours = (h: number | undefined) => (h === undefined ? '—' : h.toFixed(1));

function RemoveRecord({ kind, id, question }: { kind: 'plantings' | 'assessments'; id: number; question: string }) {
  const remove = useDeleteRecord(kind);
  return (
    <ConfirmAction size="sm" label="Remove" question={question} confirmLabel="Remove" busy={remove.isPending} onConfirm={() => remove.mutate(id)} error={remove.error} errorTitle="Not removed" />
  );
}

function OutcomeDetail({ view, canEdit }: { view: BatchOutcomeView; canEdit: boolean }) {
  const { outcome, take, plantings, assessments } = view;
  const remaining = view.count - outcome.planted;
  const plantingColumns: Column<PlantingRecord>[] = [
    { header: 'Planted on', cell: (p) => p.plantedOn, figure: true },
    { header: 'Grafts', cell: (p) => p.count, figure: true },
    { header: 'Bed or field', cell: (p) => p.location },
    { header: 'Freeze h', cell: (p) => hours(p.snapshot.exposure?.freeze.hours), figure: true },
    { header: 'Hours logged', cell: (p) => hours(p.snapshot.exposure?.hoursCovered), figure: true },
    ...(canEdit ? [{ header: 'Change', cell: (p: PlantingRecord) => <RemoveRecord kind="plantings" id={p.id} question={`Remove the ${p.plantedOn} planting?`} /> }] : []),
  ];
  const assessmentColumns: Column<AssessmentRecord>[] = [
    { header: 'Assessed on', cell: (a) => a.assessedOn, figure: true },
    { header: 'Grafts growing', cell: (a) => a.grown, figure: true },
    { header: 'Notes', cell: (a) => a.notes || '—' },
    ...(canEdit ? [{ header: 'Change', cell: (a: AssessmentRecord) => <RemoveRecord kind="assessments" id={a.id} question={`Remove the ${a.assessedOn} count?`} /> }] : []),
  ];
  return (
    <div className="space-y-6">
      <p className="text-lg">
        {take ? (
          <>
            Take: <strong>{describeTake(take)}</strong>, counted on {outcome.assessedOn}.
          </>
        ) : (
          'No take yet: it is counted once the batch is planted out and assessed.'
        )}
      </p>
      <section className="space-y-3">
        <h3 className="font-semibold text-slate-deep">
          Planted out: {outcome.planted} of {view.count} grafts
        </h3>
        {plantings.length > 0 && <Table<PlantingRecord> caption="Planting rows" rows={plantings} rowKey={(p) => p.id} columns={plantingColumns} />}
        {canEdit && remaining > 0 && view.status !== 'discarded' && <PlantingForm key={remaining} batchId={view.batchId} remaining={remaining} />}
      </section>
      {outcome.planted > 0 && (
        <section className="space-y-3">
          <h3 className="font-semibold text-slate-deep">Take assessments</h3>
          {assessments.length > 0 && <Table<AssessmentRecord> caption="Take assessments" rows={assessments} rowKey={(a) => a.id} columns={assessmentColumns} />}
          {canEdit && <AssessmentForm key={outcome.planted} batchId={view.batchId} planted={outcome.planted} />}
        </section>
      )}
    </div>
  );
}

/**
 * For the batch page: its planting rows (storage figures frozen in each), its assessments and its take. The batch is
 * marked planted out when its last graft is planted.
 */
export function BatchOutcomePanel({ batchId }: { batchId: number }) {
  const view = useBatchOutcome(batchId);
  const canEdit = useRoleAtLeast('staff');
  return (
    <Panel title="Planting out and take" description="Record each part as it goes out, then count the grafts growing; the latest count over the grafts planted is the take.">
      <QueryResult query={view} loading="Loading planting records…" failed="Could not load the planting records">
        {(v) => <OutcomeDetail view={v} canEdit={canEdit} />}
      </QueryResult>
    </Panel>
  );
}
