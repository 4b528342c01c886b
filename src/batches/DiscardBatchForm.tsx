import { batchLeaveBody } from '../../shared/schemas/batches';
import { useCurrentSession } from '../auth/useCurrentSession';
import { fromZonedInputValue, zoneAbbreviation } from '../time/nurseryTime';
import { ConfirmAction } from '../ui/ConfirmAction';
import { Field, Input } from '../ui/Field';
import { useZodForm } from '../ui/useZodForm';
import { useDiscardBatch, type Batch } from './queries';

/** Takes a lost batch out of storage with a note on why; asks once before doing it. */
export function DiscardBatchForm({ batch }: { batch: Batch }) {
  const zone = useCurrentSession().nursery.timeZone;
  const discard = useDiscardBatch(batch.id);
  const { register, handleSubmit, formState } = useZodForm(batchLeaveBody, { defaultValues: { note: '', at: undefined } });
  const { errors } = formState;
  return (
    <form noValidate className="flex flex-col gap-4" onSubmit={(e) => e.preventDefault()}>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Why" hint="Frozen, dried out, failed unions…" error={errors.note?.message}>
          {(c) => <Input {...c} {...register('note')} />}
        </Field>
        <Field label="When" hint={`On the nursery's clock (${zoneAbbreviation(zone)}). Leave empty for now.`} error={errors.at?.message}>
          {(c) => <Input {...c} type="datetime-local" {...register('at', { setValueAs: (v: string) => (v ? fromZonedInputValue(v, zone) : undefined) })} />}
        </Field>
      </div>
      <ConfirmAction
        label="Discard batch"
        question={`Discard ${batch.code} (${batch.count} grafts)?`}
        confirmLabel="Discard"
        busy={discard.isPending}
        onConfirm={() => void handleSubmit((body) => discard.mutate(body))()}
        error={discard.error}
        errorTitle="The batch was not discarded"
      />
    </form>
  );
}
