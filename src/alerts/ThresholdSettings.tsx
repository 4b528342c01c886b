import { useState } from 'react';
import { nurseryThresholdsPatch, roomThresholdsPatch } from '../../shared/schemas/alerts';
import { useCurrentSession, useRoleAtLeast } from '../auth/useCurrentSession';
import { useRooms } from '../rooms/queries';
import { ConfirmAction } from '../ui/ConfirmAction';
import { DetailList } from '../ui/DetailList';
import { Field, Select } from '../ui/Field';
import { Panel } from '../ui/Panel';
import { QueryResult } from '../ui/QueryResult';
import { useAlertSettings, useClearRoomThresholds, usePatchNurseryThresholds, usePatchRoomThresholds, type AlertSettings } from './queries';
import { describeThreshold, ROOM_FIELDS, THRESHOLD_FIELDS } from './thresholdFields';
import { ThresholdForm } from './ThresholdForm';

function RoomThresholds({ settings, roomId, roomName }: { settings: AlertSettings; roomId: number; roomName: string }) {
  const { user } = useCurrentSession();
  const patch = usePatchRoomThresholds(roomId);
  const clear = useClearRoomThresholds(roomId);
  const stored = settings.rooms.find((r) => r.roomId === roomId)?.thresholds ?? {};
  return (
    <ThresholdForm
      key={`${roomId}:${JSON.stringify(stored)}`}
      fields={ROOM_FIELDS}
      stored={stored}
      inherited={settings.effective}
      inheritedFrom="nursery"
      unit={user.unit}
      schema={roomThresholdsPatch}
      onSave={(body) => patch.mutate(body)}
      busy={patch.isPending}
      error={patch.error}
      saved={patch.isSuccess}
      submitLabel={`Save ${roomName}`}
    >
      {Object.keys(stored).length > 0 && (
        <ConfirmAction
          label="Follow the nursery again"
          question={`Drop every threshold set for ${roomName}?`}
          confirmLabel="Drop them"
          busy={clear.isPending}
          onConfirm={() => clear.mutate(undefined)}
          error={clear.error}
          errorTitle="Not changed"
        />
      )}
    </ThresholdForm>
  );
}

function OwnerThresholds({ settings }: { settings: AlertSettings }) {
  const { user } = useCurrentSession();
  const patch = usePatchNurseryThresholds();
  const rooms = useRooms();
  const [roomId, setRoomId] = useState<number | null>(null);
  const room = rooms.data?.find((r) => r.id === roomId) ?? null;
  const overridden = new Set(settings.rooms.map((r) => r.roomId));
  return (
    <div className="flex flex-col gap-8">
      <ThresholdForm
        key={JSON.stringify(settings.nursery)}
        fields={THRESHOLD_FIELDS}
        stored={settings.nursery}
        inherited={settings.defaults}
        inheritedFrom="default"
        unit={user.unit}
        schema={nurseryThresholdsPatch}
        onSave={(body) => patch.mutate(body)}
        busy={patch.isPending}
        error={patch.error}
        saved={patch.isSuccess}
        submitLabel="Save nursery thresholds"
      />
      <section aria-label="Thresholds of one room" className="flex flex-col gap-4 border-t border-frost-deep pt-6">
        <h3 className="text-lg font-bold text-slate-deep">One room differently</h3>
        <Field label="Room" hint="A room's own value wins over the nursery's; rooms marked * have some of their own.">
          {(c) => (
            <Select {...c} value={roomId ?? ''} onChange={(e) => setRoomId(e.target.value ? Number(e.target.value) : null)}>
              <option value="">Choose a room</option>
              {(rooms.data ?? []).map((r) => (
                <option key={r.id} value={r.id}>
                  {r.name}
                  {overridden.has(r.id) ? ' *' : ''}
                </option>
              ))}
            </Select>
          )}
        </Field>
        {room && <RoomThresholds settings={settings} roomId={room.id} roomName={room.name} />}
      </section>
    </div>
  );
}

/** Owners set thresholds; everyone else sees the ones in force. */
export function ThresholdSettings() {
  const settings = useAlertSettings();
  const isOwner = useRoleAtLeast('owner');
  const { user } = useCurrentSession();
  return (
    <Panel title="Thresholds" description={isOwner ? 'For the whole nursery, and for single rooms where they should differ.' : 'Only an owner can change these.'}>
      <QueryResult query={settings} loading="Loading thresholds…" failed="Could not load the thresholds">
        {(s) =>
          isOwner ? (
            <OwnerThresholds settings={s} />
          ) : (
            <DetailList
              items={THRESHOLD_FIELDS.map((f) => ({ label: f.label, value: describeThreshold(f, s.effective[f.key], user.unit) }))}
            />
          )
        }
      </QueryResult>
    </Panel>
  );
}
