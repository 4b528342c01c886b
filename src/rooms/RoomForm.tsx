import { ROOM_KINDS, roomBody, type RoomInput } from '../../shared/schemas/rooms';
import type { z } from 'zod';
import { Field, Input, Select, TextArea } from '../ui/Field';
import { FormActions } from '../ui/FormActions';
import { useZodForm } from '../ui/useZodForm';
import { roomKindLabel } from './roomKinds';

interface RoomFormProps {
  initial: RoomInput;
  submitLabel: string;
  cancelTo: string;
  busy: boolean;
  error: unknown;
  onSubmit: (body: z.output<typeof roomBody>) => void;
}

export function RoomForm({ initial, submitLabel, cancelTo, busy, error, onSubmit }: RoomFormProps) {
  const { register, handleSubmit, formState } = useZodForm(roomBody, { defaultValues: initial });
  const { errors } = formState;
  return (
    <form noValidate onSubmit={handleSubmit(onSubmit)} className="flex max-w-xl flex-col gap-4">
      <Field label="Name" hint="What the crew calls it, e.g. Root cellar." error={errors.name?.message}>
        {(c) => <Input {...c} {...register('name')} />}
      </Field>
      <Field label="Kind" error={errors.kind?.message}>
        {(c) => (
          <Select {...c} {...register('kind')}>
            {ROOM_KINDS.map((kind) => (
              <option key={kind} value={kind}>
                {roomKindLabel(kind)}
              </option>
            ))}
          </Select>
        )}
      </Field>
      <Field label="Notes" hint="Where it is, what it is like, what to watch for." error={errors.notes?.message}>
        {(c) => <TextArea {...c} {...register('notes')} rows={4} />}
      </Field>
      <FormActions submitLabel={submitLabel} busyLabel="Saving…" busy={busy} error={error} cancelTo={cancelTo} />
    </form>
  );
}
