import { Link, useNavigate, useParams } from 'react-router-dom';
import { acceptInviteBody } from '../../shared/schemas/auth';
import { Field, Input } from '../ui/Field';
import { FormActions } from '../ui/FormActions';
import { QueryResult } from '../ui/QueryResult';
import { RoleBadge } from '../ui/RoleBadge';
import { useZodForm } from '../ui/useZodForm';
import { AuthLayout } from './AuthLayout';
import { PasswordInput } from './PasswordInput';
import { useAcceptInvitation, useInvitationPreview, type InvitationPreview } from './queries';
import { ROLE_DESCRIPTIONS } from './roles';

function AcceptForm({ token, invitation }: { token: string; invitation: InvitationPreview }) {
  const accept = useAcceptInvitation(token);
  const navigate = useNavigate();
  const { register, handleSubmit, formState } = useZodForm(acceptInviteBody, { defaultValues: { name: '', password: '' } });
  const { errors } = formState;
  return (
    <>
      <p className="mb-4">
        You have been invited to <strong>{invitation.nurseryName}</strong> as <RoleBadge role={invitation.role} />
        <span className="mt-1 block text-sm text-ink-soft">{ROLE_DESCRIPTIONS[invitation.role]}.</span>
      </p>
      <form
        noValidate
        onSubmit={handleSubmit((body) => accept.mutate(body, { onSuccess: () => navigate('/overview', { replace: true }) }))}
        className="flex flex-col gap-4"
      >
        <Field label="E-mail" hint="You will sign in with this address.">
          {(c) => <Input {...c} value={invitation.email} readOnly autoComplete="username" className="font-mono" />}
        </Field>
        <Field label="Your name" error={errors.name?.message}>
          {(c) => <Input {...c} {...register('name')} autoComplete="name" />}
        </Field>
        <Field label="Choose a password" hint="At least 10 characters." error={errors.password?.message}>
          {(c) => <PasswordInput {...c} {...register('password')} autoComplete="new-password" />}
        </Field>
        <FormActions submitLabel={`Join ${invitation.nurseryName}`} busyLabel="Joining…" busy={accept.isPending} error={accept.error} wide />
      </form>
    </>
  );
}

export function AcceptInvitationPage() {
  const { token = '' } = useParams();
  const preview = useInvitationPreview(token);
  return (
    <AuthLayout title="Accept invitation">
      <QueryResult query={preview} loading="Opening the invitation…" failed="This invitation cannot be used">
        {(invitation) => <AcceptForm token={token} invitation={invitation} />}
      </QueryResult>
      {preview.isError && (
        <p className="mt-4">
          <Link to="/sign-in" className="font-semibold text-slate underline underline-offset-4">
            Go to sign-in
          </Link>
        </p>
      )}
    </AuthLayout>
  );
}
