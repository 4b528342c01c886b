import { get } from 'react-hook-form';
import { useNavigate, useParams } from 'react-router-dom';
import { profilePatch } from '../../shared/schemas/profiles';
import type { SourcedField } from '../../shared/species/schema';
import { NotFoundPage } from '../layout/NotFoundPage';
import { ConfirmAction } from '../ui/ConfirmAction';
import { Field, Input } from '../ui/Field';
import { FormActions } from '../ui/FormActions';
import { PageHeader } from '../ui/PageHeader';
import { Panel } from '../ui/Panel';
import { QueryResult } from '../ui/QueryResult';
import { useZodForm } from '../ui/useZodForm';
import { useDeleteProfile, useProfiles, useUpdateProfile, type ListedProfile } from './queries';

type NumberPath = 'freezeC' | 'band.minC' | 'band.maxC' | 'callus.baseC' | 'callus.optLowC' | 'callus.optHighC' | 'callus.upperC' | 'callus.hoursAtOptimum';

const NUMBERS: { path: NumberPath; label: string }[] = [
  { path: 'band.minC', label: 'Band minimum (°C)' },
  { path: 'band.maxC', label: 'Band maximum (°C)' },
  { path: 'freezeC', label: 'Freeze limit (°C)' },
  { path: 'callus.baseC', label: 'Callus base: no callus at or below (°C)' },
  { path: 'callus.optLowC', label: 'Callus optimum from (°C)' },
  { path: 'callus.optHighC', label: 'Callus optimum to (°C)' },
  { path: 'callus.upperC', label: 'Callus upper limit: none at or above (°C)' },
  { path: 'callus.hoursAtOptimum', label: 'Hours at optimum for full callus' },
];

/** Every number beside the source it currently rests on; a number changed here becomes the nursery's own value. */
function EditProfileForm({ profile }: { profile: ListedProfile }) {
  const update = useUpdateProfile(profile.key);
  const remove = useDeleteProfile(profile.key);
  const navigate = useNavigate();
  const { register, handleSubmit, formState } = useZodForm(profilePatch, {
    defaultValues: { name: profile.name, freezeC: profile.freezeC, band: profile.band, storageMaxC: profile.storageMaxC, callus: profile.callus },
  });
  const { errors } = formState;
  const errorAt = (path: NumberPath) => (get(errors, path) as { message?: string } | undefined)?.message;
  return (
    <div className="flex flex-col gap-6">
      <form noValidate className="flex flex-col gap-4" onSubmit={handleSubmit((body) => update.mutate(body, { onSuccess: () => navigate('/profiles') }))}>
        <Panel title="Numbers" description="Based on the built-in profile for this species. Each hint is the number's current source.">
          <div className="flex flex-col gap-4">
            <Field label="Name" error={errors.name?.message}>
              {(c) => <Input {...c} {...register('name')} />}
            </Field>
            <div className="grid gap-4 sm:grid-cols-2">
              {NUMBERS.map(({ path, label }) => (
                <Field key={path} label={label} hint={profile.sources[path as SourcedField]} error={errorAt(path)}>
                  {(c) => <Input {...c} type="number" step="any" inputMode="decimal" className="font-mono" {...register(path, { valueAsNumber: true })} />}
                </Field>
              ))}
              <Field label="Too warm for cold storage above (°C)" hint={`Empty for species kept warm. ${profile.sources.storageMaxC}`} error={errors.storageMaxC?.message}>
                {(c) => (
                  <Input {...c} type="number" step="any" inputMode="decimal" className="font-mono" {...register('storageMaxC', { setValueAs: (v: string | number | null) => (v === '' || v === null ? null : Number(v)) })} />
                )}
              </Field>
            </div>
          </div>
        </Panel>
        <FormActions submitLabel="Save profile" busyLabel="Saving…" busy={update.isPending} error={update.error} cancelTo="/profiles" />
      </form>
      <Panel title="Remove" description={profile.batchCount ? `${profile.batchCount} batches use this profile; move them to another first.` : 'No batch uses this profile.'}>
        <ConfirmAction
          label="Remove profile"
          question={`Remove ${profile.name}?`}
          confirmLabel="Remove"
          busy={remove.isPending}
          onConfirm={() => remove.mutate(undefined, { onSuccess: () => navigate('/profiles', { replace: true }) })}
          error={remove.error}
          errorTitle="The profile was not removed"
        />
      </Panel>
    </div>
  );
}

export function EditProfilePage() {
  const key = useParams().key ?? '';
  const profiles = useProfiles();
  return (
    <QueryResult query={profiles} loading="Loading the profile…" failed="Could not load the profile">
      {(list) => {
        const profile = list.find((p) => p.key === key && p.origin === 'nursery');
        if (!profile) return <NotFoundPage what="profile of this nursery" />;
        return (
          <>
            <PageHeader title={`Edit ${profile.name}`} description={`Key ${profile.key}, copied from ${profile.basedOn}.`} back={{ to: '/profiles', label: 'Species profiles' }} />
            <EditProfileForm profile={profile} />
          </>
        );
      }}
    </QueryResult>
  );
}
