import { useState } from 'react';
import { batchMoveBody } from '../../shared/schemas/batches';
import { useCurrentSession } from '../auth/useCurrentSession';
import type { Room } from '../rooms/queries';
import { formatInstant, fromZonedInputValue, zoneAbbreviation } from '../time/nurseryTime';
import { Field, Input } from '../ui/Field';
import { FormActions } from '../ui/FormActions';
import { useZodForm } from '../ui/useZodForm';
import { useMoveBatch, type Batch } from './queries';
import { readRoomId, RoomPicker } from './RoomPicker';

/** Records that the batch was carried to another room; the time is on the nursery's clock, empty meaning now. */
export function MoveBatchForm({ batch, rooms }: { batch: Batch; rooms: Room[] }) {
  const zone = useCurrentSession().nursery.timeZone;
  const move = useMoveBatch(batch.id);
  const [done, setDone] = useState<string | null>(null);
  const { register, handleSubmit, formState, reset } = useZodForm(batchMoveBody, { defaultValues: { at: undefined } });
  const { errors } = formState;
  const others = rooms.filter((r) => r.id !== batch.roomId);
  return (
    <form
      noValidate
      className="flex flex-col gap-4"
      onSubmit={handleSubmit((body) => {
        setDone(null);
        move.mutate(body, {
          onSuccess: () => {
            const name = rooms.find((r) => r.id === body.roomId)?.name ?? 'the room';
            setDone(`Moved to ${name} ${body.at ? `on ${formatInstant(body.at, zone)}` : 'now'}.`);
            reset();
          },
        });
      })}
    >
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Move to" error={errors.roomId?.message}>
          {(c) => <RoomPicker {...c} rooms={others} placeholder="Choose a room…" {...register('roomId', { setValueAs: readRoomId })} />}
        </Field>
        <Field label="When" hint={`On the nursery's clock (${zoneAbbreviation(zone)}). Leave empty for now.`} error={errors.at?.message}>
          {(c) => <Input {...c} type="datetime-local" {...register('at', { setValueAs: (v: string) => (v ? fromZonedInputValue(v, zone) : undefined) })} />}
        </Field>
      </div>
      <FormActions submitLabel="Record move" busyLabel="Moving…" busy={move.isPending} error={move.error} success={done} />
    </form>
  );
}
