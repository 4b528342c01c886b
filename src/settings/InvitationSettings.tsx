import { inviteBody } from '../../shared/schemas/auth';
import { ROLES } from '../../shared/schemas/common';
import { useCurrentSession } from '../auth/useCurrentSession';
import { ROLE_DESCRIPTIONS } from '../auth/roles';
import { formatInstant } from '../time/nurseryTime';
import { ConfirmAction } from '../ui/ConfirmAction';
import { Field, Input, Select } from '../ui/Field';
import { FormActions } from '../ui/FormActions';
import { Panel } from '../ui/Panel';
import { QueryResult } from '../ui/QueryResult';
import { RoleBadge } from '../ui/RoleBadge';
import { Table } from '../ui/Table';
import { useZodForm } from '../ui/useZodForm';
import { useCancelInvitation, useInvitations, useInvite, type Invitation } from './queries';

function InviteForm({ zone }: { zone: string }) {
  const invite = useInvite();
  const { register, handleSubmit, formState, reset } = useZodForm(inviteBody, { defaultValues: { email: '', role: 'staff' } });
  const { errors } = formState;
  return (
    <form
      noValidate
      onSubmit={handleSubmit((body) => invite.mutate(body, { onSuccess: () => reset({ email: '', role: body.role }) }))}
      className="flex flex-col gap-4"
    >
      <div className="grid gap-4 sm:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <Field label="E-mail" error={errors.email?.message}>
          {(c) => <Input {...c} {...register('email')} type="email" autoComplete="off" />}
        </Field>
        <Field label="Role" error={errors.role?.message}>
          {(c) => (
            <Select {...c} {...register('role')} className="capitalize">
              {ROLES.map((role) => (
                <option key={role} value={role}>
                  {role}
                </option>
              ))}
            </Select>
          )}
        </Field>
      </div>
      <ul className="grid gap-1 text-sm text-ink-soft sm:grid-cols-3">
        {ROLES.map((role) => (
          <li key={role}>
            <span className="font-semibold capitalize text-ink">{role}:</span> {ROLE_DESCRIPTIONS[role]}.
          </li>
        ))}
      </ul>
      <FormActions
        submitLabel="Send invitation"
        busyLabel="Sending…"
        busy={invite.isPending}
        error={invite.error}
        success={invite.isSuccess && `Invitation sent to ${invite.data.email}. The link works once, until ${formatInstant(invite.data.expiresAt, zone)}.`}
      />
    </form>
  );
}

function CancelCell({ invitation }: { invitation: Invitation }) {
  const cancel = useCancelInvitation();
  return (
    <ConfirmAction
      size="sm"
      label="Cancel"
      question={`Cancel the invitation to ${invitation.email}?`}
      confirmLabel="Cancel invitation"
      busy={cancel.isPending}
      onConfirm={() => cancel.mutate(invitation.id)}
      error={cancel.error}
      errorTitle="Not cancelled"
    />
  );
}

export function InvitationSettings() {
  const invitations = useInvitations();
  const { nursery } = useCurrentSession();
  return (
    <Panel title="Invitations" description="Invite someone by e-mail; they choose their own name and password.">
      <div className="flex flex-col gap-6">
        <InviteForm zone={nursery.timeZone} />
        <QueryResult query={invitations} loading="Loading invitations…" failed="Could not load the invitations">
          {(list) =>
            list.length === 0 ? (
              <p className="text-ink-soft">No invitations are waiting.</p>
            ) : (
              <div>
                <h3 className="mb-2 font-bold text-slate-deep">Waiting for an answer</h3>
                <Table<Invitation>
                  caption="Invitations waiting for an answer"
                  rows={list}
                  rowKey={(i) => i.id}
                  columns={[
                    { header: 'E-mail', cell: (i) => <span className="break-all">{i.email}</span> },
                    { header: 'Role', cell: (i) => <RoleBadge role={i.role} /> },
                    { header: 'Expires', cell: (i) => formatInstant(i.expiresAt, nursery.timeZone), figure: true },
                    { header: 'Action', cell: (i) => <CancelCell invitation={i} /> },
                  ]}
                />
              </div>
            )
          }
        </QueryResult>
      </div>
    </Panel>
  );
}
