import { DateTime } from 'luxon';
import { assessmentBody } from '../../shared/season/schemas';
import { useCurrentSession } from '../auth/useCurrentSession';
import { Field, Input } from '../ui/Field';
import { FormActions } from '../ui/FormActions';
import { useZodForm } from '../ui/useZodForm';
import { useAddAssessment } from './queries';

/** Count the grafts found growing; the latest count is the batch's take. */
export function AssessmentForm({ batchId, planted }: { batchId: number; planted: number }) {
  const { nursery } = useCurrentSession();
  const add = useAddAssessment(batchId);
  const today = DateTime.now().setZone(nursery.timeZone).toISODate()!;
  const { register, handleSubmit, formState } = useZodForm(assessmentBody, { defaultValues: { assessedOn: today, grown: planted, notes: '' } });
  const { errors } = formState;
  return (
    <form noValidate onSubmit={handleSubmit((body) => add.mutate(body))} className="grid max-w-2xl gap-4 sm:grid-cols-3">
      <Field label="Assessed on" error={errors.assessedOn?.message}>
        {(c) => <Input {...c} type="date" max={today} {...register('assessedOn')} />}
      </Field>
      <Field label="Grafts growing" hint={`of ${planted} planted`} error={errors.grown?.message}>
        {(c) => <Input {...c} type="number" inputMode="numeric" min={0} max={planted} {...register('grown')} />}
      </Field>
      <Field label="Notes" error={errors.notes?.message}>
        {(c) => <Input {...c} {...register('notes')} />}
      </Field>
      <div className="sm:col-span-3">
        <FormActions submitLabel="Record assessment" busyLabel="Recording…" busy={add.isPending} error={add.error} success={add.isSuccess && 'Assessment recorded.'} />
      </div>
    </form>
  );
}
