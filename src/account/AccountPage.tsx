import { passwordChangeBody } from '../../shared/schemas/auth';
import { PasswordInput } from '../auth/PasswordInput';
import { useChangePassword } from '../auth/queries';
import { useCurrentSession } from '../auth/useCurrentSession';
import { DetailList } from '../ui/DetailList';
import { Field } from '../ui/Field';
import { FormActions } from '../ui/FormActions';
import { PageHeader } from '../ui/PageHeader';
import { Panel } from '../ui/Panel';
import { RoleBadge } from '../ui/RoleBadge';
import { useZodForm } from '../ui/useZodForm';
import { UnitPreference } from './UnitPreference';

function PasswordForm() {
  const change = useChangePassword();
  const { register, handleSubmit, formState, reset } = useZodForm(passwordChangeBody, { defaultValues: { currentPassword: '', newPassword: '' } });
  const { errors } = formState;
  return (
    <form noValidate onSubmit={handleSubmit((body) => change.mutate(body, { onSuccess: () => reset() }))} className="flex max-w-md flex-col gap-4">
      <Field label="Current password" error={errors.currentPassword?.message}>
        {(c) => <PasswordInput {...c} {...register('currentPassword')} autoComplete="current-password" />}
      </Field>
      <Field label="New password" hint="At least 10 characters. Other devices signed in as you are signed out." error={errors.newPassword?.message}>
        {(c) => <PasswordInput {...c} {...register('newPassword')} autoComplete="new-password" />}
      </Field>
      <FormActions
        submitLabel="Change password"
        busyLabel="Changing…"
        busy={change.isPending}
        error={change.error}
        success={change.isSuccess && 'Password changed.'}
      />
    </form>
  );
}

export function AccountPage() {
  const { user } = useCurrentSession();
  return (
    <>
      <PageHeader title="Your account" />
      <div className="flex flex-col gap-6">
        <Panel title="You">
          <DetailList
            items={[
              { label: 'Name', value: user.name },
              { label: 'E-mail', value: user.email },
              { label: 'Role', value: <RoleBadge role={user.role} /> },
            ]}
          />
        </Panel>
        <Panel title="Temperature unit" description="How temperatures are shown to you; others choose their own.">
          <UnitPreference />
        </Panel>
        <Panel title="Password">
          <PasswordForm />
        </Panel>
      </div>
    </>
  );
}
