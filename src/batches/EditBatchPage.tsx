import { useNavigate } from 'react-router-dom';
import { batchPatch } from '../../shared/schemas/batches';
import { NotFoundPage } from '../layout/NotFoundPage';
import { useProfiles, type ListedProfile } from '../profiles/queries';
import { Field, Input, TextArea } from '../ui/Field';
import { FormActions } from '../ui/FormActions';
import { PageHeader } from '../ui/PageHeader';
import { QueryResult } from '../ui/QueryResult';
import { useIdParam } from '../ui/useIdParam';
import { useZodForm } from '../ui/useZodForm';
import { useBatch, useUpdateBatch, type Batch } from './queries';
import { SpeciesSelect } from './SpeciesSelect';
import { MEDIUM_LIST_ID, METHOD_LIST_ID, Suggestions } from './Suggestions';

/** Corrections to what was written down; moves have their own form with a time, on the batch page. */
function EditBatchForm({ batch, profiles }: { batch: Batch; profiles: ListedProfile[] }) {
  const update = useUpdateBatch(batch.id);
  const navigate = useNavigate();
  const { roomId: _room, placements: _p, status: _s, leftAt: _l, leftNote: _n, id: _id, ...fields } = batch;
  const { register, handleSubmit, formState } = useZodForm(batchPatch, { defaultValues: fields });
  const { errors } = formState;
  const text = (name: 'code' | 'scionCultivar' | 'rootstock' | 'grafter', label: string, extra: { className?: string } = {}) => (
    <Field label={label} error={errors[name]?.message}>
      {(c) => <Input {...c} {...extra} {...register(name)} />}
    </Field>
  );
  return (
    <form noValidate className="flex max-w-3xl flex-col gap-4" onSubmit={handleSubmit((body) => update.mutate(body, { onSuccess: () => navigate(`/batches/${batch.id}`) }))}>
      <Suggestions />
      <div className="grid gap-4 sm:grid-cols-2">
        {text('code', 'Code', { className: 'font-mono' })}
        <Field label="Species profile" hint="Changing it recomputes the exposure against the new limits." error={errors.species?.message}>
          {(c) => <SpeciesSelect {...c} profiles={profiles} {...register('species')} />}
        </Field>
        {text('scionCultivar', 'Scion cultivar')}
        {text('rootstock', 'Rootstock')}
        <Field label="Method" error={errors.method?.message}>
          {(c) => <Input {...c} list={METHOD_LIST_ID} {...register('method')} />}
        </Field>
        <Field label="Grafts" error={errors.count?.message}>
          {(c) => <Input {...c} type="number" inputMode="numeric" min={1} {...register('count')} />}
        </Field>
        <Field label="Grafted on" error={errors.graftedOn?.message}>
          {(c) => <Input {...c} type="date" {...register('graftedOn')} />}
        </Field>
        {text('grafter', 'Grafted by')}
        <Field label="Storage medium" error={errors.storageMedium?.message}>
          {(c) => <Input {...c} list={MEDIUM_LIST_ID} {...register('storageMedium')} />}
        </Field>
      </div>
      <Field label="Notes" error={errors.notes?.message}>
        {(c) => <TextArea {...c} rows={3} {...register('notes')} />}
      </Field>
      <FormActions submitLabel="Save" busyLabel="Saving…" busy={update.isPending} error={update.error} cancelTo={`/batches/${batch.id}`} />
    </form>
  );
}

function EditBatch({ id }: { id: number }) {
  const batch = useBatch(id);
  const profiles = useProfiles();
  return (
    <QueryResult query={batch} loading="Loading the batch…" failed="Could not load the batch">
      {(b) => (
        <>
          <PageHeader title={`Edit ${b.code}`} back={{ to: `/batches/${b.id}`, label: b.code }} />
          <QueryResult query={profiles} loading="Loading species…" failed="Could not load the species profiles">
            {(list) => <EditBatchForm batch={b} profiles={list} />}
          </QueryResult>
        </>
      )}
    </QueryResult>
  );
}

export function EditBatchPage() {
  const id = useIdParam();
  return id === null ? <NotFoundPage what="batch" /> : <EditBatch id={id} />;
}
