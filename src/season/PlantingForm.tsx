import { DateTime } from 'luxon';
import { plantingBody } from '../../shared/season/schemas';
import { useCurrentSession } from '../auth/useCurrentSession';
import { Field, Input } from '../ui/Field';
import { FormActions } from '../ui/FormActions';
import { useZodForm } from '../ui/useZodForm';
import { useAddPlanting } from './queries';

/** Plant out all or part of a batch; the count starts at what is still in storage (the parent remounts it when that changes). */
export function PlantingForm({ batchId, remaining }: { batchId: number; remaining: number }) {
  const { nursery } = useCurrentSession();
  const add = useAddPlanting(batchId);
  const today = DateTime.now().setZone(nursery.timeZone).toISODate()!;
  const { register, handleSubmit, formState } = useZodForm(plantingBody, { defaultValues: { plantedOn: today, count: remaining, location: '', notes: '' } });
  const { errors } = formState;
  return (
    <form
      noValidate
      onSubmit={handleSubmit((body) => add.mutate(body))}
      className="grid max-w-2xl gap-4 sm:grid-cols-3"
    >
      <Field label="Planted on" error={errors.plantedOn?.message}>
        {(c) => <Input {...c} type="date" max={today} {...register('plantedOn')} />}
      </Field>
      <Field label="Grafts planted" hint={`${remaining} still in storage`} error={errors.count?.message}>
        {(c) => <Input {...c} type="number" inputMode="numeric" min={1} max={remaining} {...register('count')} />}
      </Field>
      <Field label="Bed or field" error={errors.location?.message}>
        {(c) => <Input {...c} autoComplete="off" {...register('location')} />}
      </Field>
      <Field label="Notes" className="sm:col-span-3" error={errors.notes?.message}>
        {(c) => <Input {...c} {...register('notes')} />}
      </Field>
      <div className="sm:col-span-3">
        <FormActions submitLabel="Record planting" busyLabel="Recording…" busy={add.isPending} error={add.error} />
      </div>
    </form>
  );
}
