import { useCurrentSession, useRoleAtLeast } from '../auth/useCurrentSession';
import { NotFoundPage } from '../layout/NotFoundPage';
import { PlacementHistory } from '../loggers/PlacementHistory';
import { RoomName } from '../loggers/RoomName';
import { useProfiles } from '../profiles/queries';
import { useRooms } from '../rooms/queries';
import { BatchOutcomePanel } from '../season/routes';
import { formatInstant } from '../time/nurseryTime';
import { ButtonLink } from '../ui/Button';
import { DetailList } from '../ui/DetailList';
import { PageHeader } from '../ui/PageHeader';
import { Panel } from '../ui/Panel';
import { QueryResult } from '../ui/QueryResult';
import { useIdParam } from '../ui/useIdParam';
import { BatchExposurePanel } from './BatchExposurePanel';
import { STATUS_LABEL } from './batchStatus';
import { CallusPanel } from './CallusPanel';
import { DiscardBatchForm } from './DiscardBatchForm';
import { MoveBatchForm } from './MoveBatchForm';
import { useBatch, useBatchExposure } from './queries';
import { speciesName } from './SpeciesSelect';

function ExposureAndCallus({ id }: { id: number }) {
  const exposure = useBatchExposure(id);
  const { user, nursery } = useCurrentSession();
  return (
    <QueryResult query={exposure} loading="Working out exposure…" failed="Could not work out the exposure">
      {(e) => (
        <>
          <CallusPanel exposure={e} unit={user.unit} zone={nursery.timeZone} />
          <BatchExposurePanel exposure={e} unit={user.unit} zone={nursery.timeZone} />
        </>
      )}
    </QueryResult>
  );
}

function BatchDetail({ id }: { id: number }) {
  const batch = useBatch(id);
  const rooms = useRooms();
  const profiles = useProfiles();
  const canEdit = useRoleAtLeast('staff');
  const zone = useCurrentSession().nursery.timeZone;
  return (
    <QueryResult query={batch} loading="Loading the batch…" failed="Could not load the batch">
      {(b) => (
        <>
          <PageHeader
            title={`${b.code} · ${b.scionCultivar}`}
            description={`${speciesName(profiles.data, b.species)} on ${b.rootstock} · ${b.count} grafts · ${STATUS_LABEL[b.status]}`}
            back={{ to: '/batches', label: 'Batches' }}
            actions={canEdit && <ButtonLink to={`/batches/${b.id}/edit`} variant="secondary">Edit</ButtonLink>}
          />
          <div className="flex flex-col gap-6">
            <ExposureAndCallus id={b.id} />
            <Panel title="About this batch">
              <DetailList
                items={[
                  { label: 'Species profile', value: speciesName(profiles.data, b.species) },
                  { label: 'Scion on rootstock', value: `${b.scionCultivar} on ${b.rootstock}` },
                  { label: 'Method', value: b.method },
                  { label: 'Grafts', value: b.count, figure: true },
                  { label: 'Grafted on', value: b.graftedOn, figure: true },
                  { label: 'Grafted by', value: b.grafter || '—' },
                  { label: 'Storage medium', value: b.storageMedium || '—' },
                  { label: 'Room now', value: <RoomName roomId={b.roomId} rooms={rooms.data} /> },
                  ...(b.leftAt ? [{ label: STATUS_LABEL[b.status], value: `${formatInstant(b.leftAt, zone)}${b.leftNote ? ` — ${b.leftNote}` : ''}` }] : []),
                  { label: 'Notes', value: b.notes || 'No notes yet.' },
                ]}
              />
            </Panel>
            {canEdit && b.status === 'in_storage' && (
              <Panel title="Move" description="Record it when the batch is carried to another room.">
                <QueryResult query={rooms} loading="Loading rooms…" failed="Could not load the rooms">
                  {(list) => <MoveBatchForm batch={b} rooms={list} />}
                </QueryResult>
              </Panel>
            )}
            <Panel title="Placement history" description={`Times in ${zone}. Exposure is summed over these stays.`}>
              <PlacementHistory placements={b.placements} rooms={rooms.data} />
            </Panel>
            <BatchOutcomePanel batchId={b.id} />
            {canEdit && b.status === 'in_storage' && (
              <Panel title="Discard" description="For a batch lost in storage. Planting out is recorded above, part by part.">
                <DiscardBatchForm batch={b} />
              </Panel>
            )}
          </div>
        </>
      )}
    </QueryResult>
  );
}

export function BatchPage() {
  const id = useIdParam();
  return id === null ? <NotFoundPage what="batch" /> : <BatchDetail id={id} />;
}
