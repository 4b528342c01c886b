import { nurseryPatch } from '../../shared/schemas/nursery';
import { useRoleAtLeast } from '../auth/useCurrentSession';
import { DetailList } from '../ui/DetailList';
import { Field, Input } from '../ui/Field';
import { FormActions } from '../ui/FormActions';
import { Panel } from '../ui/Panel';
import { QueryResult } from '../ui/QueryResult';
import { useZodForm } from '../ui/useZodForm';
import type { SessionNursery } from '../auth/queries';
import { useNursery, useUpdateNursery } from './queries';
import { TimeZoneInput } from './TimeZoneInput';

function NurseryForm({ nursery }: { nursery: SessionNursery }) {
  const update = useUpdateNursery();
  const { register, handleSubmit, formState, reset } = useZodForm(nurseryPatch, {
    defaultValues: { name: nursery.name, timeZone: nursery.timeZone },
  });
  const { errors, isDirty } = formState;
  return (
    <form
      noValidate
      onSubmit={handleSubmit((body) => update.mutate(body, { onSuccess: (saved) => reset({ name: saved.name, timeZone: saved.timeZone }) }))}
      className="flex max-w-xl flex-col gap-4"
    >
      <Field label="Nursery name" error={errors.name?.message}>
        {(c) => <Input {...c} {...register('name')} />}
      </Field>
      <Field label="Time zone" hint="Every time in Coldknit is shown on this clock." error={errors.timeZone?.message}>
        {(c) => <TimeZoneInput {...c} {...register('timeZone')} />}
      </Field>
      <FormActions
        submitLabel="Save nursery"
        busyLabel="Saving…"
        busy={update.isPending}
        error={update.error}
        success={update.isSuccess && !isDirty && 'Saved.'}
      />
    </form>
  );
}

export function NurserySettings() {
  const nursery = useNursery();
  const isOwner = useRoleAtLeast('owner');
  return (
    <Panel title="Nursery" description={isOwner ? undefined : 'Only an owner can change these.'}>
      <QueryResult query={nursery} loading="Loading the nursery…" failed="Could not load the nursery">
        {(n) =>
          isOwner ? (
            <NurseryForm nursery={n} />
          ) : (
            <DetailList
              items={[
                { label: 'Name', value: n.name },
                { label: 'Time zone', value: n.timeZone, figure: true },
              ]}
            />
          )
        }
      </QueryResult>
    </Panel>
  );
}
