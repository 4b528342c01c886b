import { useState } from 'react';
import { Link } from 'react-router-dom';
import { profileCopyBody } from '../../shared/schemas/profiles';
import { Field, Input, Select } from '../ui/Field';
import { FormActions } from '../ui/FormActions';
import { useZodForm } from '../ui/useZodForm';
import { useCopyProfile, type ListedProfile } from './queries';

/** A nursery profile starts as a copy of another, under a key of its own; its numbers are then edited. */
export function CopyProfileForm({ profiles }: { profiles: ListedProfile[] }) {
  const copy = useCopyProfile();
  const [made, setMade] = useState<ListedProfile | null>(null);
  const { register, handleSubmit, formState, reset } = useZodForm(profileCopyBody, { defaultValues: { from: profiles[0]?.key ?? '', key: '', name: '' } });
  const { errors } = formState;
  return (
    <form
      noValidate
      className="grid gap-4 sm:grid-cols-3"
      onSubmit={handleSubmit((body) => {
        setMade(null);
        copy.mutate(body, {
          onSuccess: (profile) => {
            setMade(profile);
            reset({ from: body.from, key: '', name: '' });
          },
        });
      })}
    >
      <Field label="Copy of" error={errors.from?.message}>
        {(c) => (
          <Select {...c} {...register('from')}>
            {profiles.map((p) => (
              <option key={p.key} value={p.key}>
                {p.name}
                {p.origin === 'nursery' ? ' (ours)' : ''}
              </option>
            ))}
          </Select>
        )}
      </Field>
      <Field label="Key" hint="Lower case, e.g. apple-cellar" error={errors.key?.message}>
        {(c) => <Input {...c} className="font-mono" spellCheck={false} autoCapitalize="off" {...register('key')} />}
      </Field>
      <Field label="Name" hint="As shown on batches" error={errors.name?.message}>
        {(c) => <Input {...c} {...register('name')} />}
      </Field>
      <div className="sm:col-span-3">
        <FormActions
          submitLabel="Make a copy"
          busyLabel="Copying…"
          busy={copy.isPending}
          error={copy.error}
          success={
            made && (
              <>
                Copied as {made.name}. <Link className="underline underline-offset-4" to={`/profiles/${made.key}/edit`}>Edit its numbers</Link>.
              </>
            )
          }
        />
      </div>
    </form>
  );
}
