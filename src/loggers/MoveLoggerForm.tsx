import { useState } from 'react';
import { loggerMoveBody } from '../../shared/schemas/loggers';
import { useCurrentSession } from '../auth/useCurrentSession';
import type { Room } from '../rooms/queries';
import { formatInstant, fromZonedInputValue, zoneAbbreviation } from '../time/nurseryTime';
import { Field, Input } from '../ui/Field';
import { FormActions } from '../ui/FormActions';
import { useZodForm } from '../ui/useZodForm';
import { useMoveLogger, type Logger } from './queries';
import { readRoomChoice, RoomSelect } from './RoomSelect';

/**
 * Records that the logger was carried elsewhere. The time is typed on the nursery's clock whatever the
 * browser's zone is, and sent as ISO 8601 with the nursery's offset; empty means "now".
 */
export function MoveLoggerForm({ logger, rooms }: { logger: Logger; rooms: Room[] }) {
  const { nursery } = useCurrentSession();
  const zone = nursery.timeZone;
  const move = useMoveLogger(logger.id);
  const [done, setDone] = useState<string | null>(null);
  const { register, handleSubmit, formState, reset } = useZodForm(loggerMoveBody, { defaultValues: { at: undefined } });
  const { errors } = formState;
  const roomName = (id: number | null) => (id === null ? 'no room' : (rooms.find((r) => r.id === id)?.name ?? `room ${id}`));

  return (
    <form
      noValidate
      className="flex flex-col gap-4"
      onSubmit={handleSubmit((body) => {
        setDone(null);
        move.mutate(body, {
          onSuccess: () => {
            setDone(`Moved to ${roomName(body.roomId)} ${body.at ? `on ${formatInstant(body.at, zone)}` : 'now'}.`);
            reset();
          },
        });
      })}
    >
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Move to" error={errors.roomId?.message}>
          {(c) => (
            <RoomSelect
              {...c}
              {...register('roomId', { setValueAs: (v: string) => readRoomChoice(v, 'unchosen') })}
              rooms={rooms.filter((r) => r.id !== logger.roomId)}
              placeholder="Choose a room…"
              noRoomLabel={logger.roomId === null ? 'Not in a room' : 'Not in a room (taken out)'}
            />
          )}
        </Field>
        <Field
          label="When"
          hint={`On the nursery's clock (${zone}, ${zoneAbbreviation(zone)}). Leave empty for now.`}
          error={errors.at?.message}
        >
          {(c) => <Input {...c} {...register('at', { setValueAs: (v: string) => (v ? fromZonedInputValue(v, zone) : undefined) })} type="datetime-local" />}
        </Field>
      </div>
      <FormActions submitLabel="Record move" busyLabel="Moving…" busy={move.isPending} error={move.error} success={done} />
    </form>
  );
}
