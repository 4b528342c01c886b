import type { z } from 'zod';
import { loggerBody, type LoggerInput } from '../../shared/schemas/loggers';
import type { Room } from '../rooms/queries';
import { Field, Input, TextArea } from '../ui/Field';
import { FormActions } from '../ui/FormActions';
import { useZodForm } from '../ui/useZodForm';
import { readRoomChoice, RoomSelect } from './RoomSelect';

interface LoggerFormProps {
  initial: LoggerInput;
  /** Given when creating: where the new logger starts. Later changes of room are moves, with a date. */
  rooms?: Room[];
  submitLabel: string;
  cancelTo: string;
  busy: boolean;
  error: unknown;
  onSubmit: (body: z.output<typeof loggerBody>) => void;
}

export function LoggerForm({ initial, rooms, submitLabel, cancelTo, busy, error, onSubmit }: LoggerFormProps) {
  const { register, handleSubmit, formState } = useZodForm(loggerBody, { defaultValues: initial });
  const { errors } = formState;
  return (
    <form noValidate onSubmit={handleSubmit(onSubmit)} className="flex max-w-xl flex-col gap-4">
      <Field label="Label" hint="The name written on the logger, e.g. K-06." error={errors.label?.message}>
        {(c) => <Input {...c} {...register('label')} />}
      </Field>
      <Field label="Serial number" hint="Optional; as printed by the maker." error={errors.serial?.message}>
        {(c) => <Input {...c} {...register('serial')} className="font-mono" spellCheck={false} />}
      </Field>
      {rooms && (
        <Field label="Room" hint="Where it is placed from now on." error={errors.roomId?.message}>
          {(c) => (
            <RoomSelect
              {...c}
              {...register('roomId', { setValueAs: (v: string) => readRoomChoice(v, 'no room') })}
              rooms={rooms}
              noRoomLabel="Not in a room yet"
            />
          )}
        </Field>
      )}
      <Field label="Notes" hint="Where exactly it sits, battery changes, quirks." error={errors.notes?.message}>
        {(c) => <TextArea {...c} {...register('notes')} rows={3} />}
      </Field>
      <FormActions submitLabel={submitLabel} busyLabel="Saving…" busy={busy} error={error} cancelTo={cancelTo} />
    </form>
  );
}
