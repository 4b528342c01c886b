import { tokenBody } from '../../shared/schemas/nursery';
import { useCurrentSession } from '../auth/useCurrentSession';
import { formatInstant } from '../time/nurseryTime';
import { ConfirmAction } from '../ui/ConfirmAction';
import { Field, Input } from '../ui/Field';
import { FormActions } from '../ui/FormActions';
import { Panel } from '../ui/Panel';
import { QueryResult } from '../ui/QueryResult';
import { Table } from '../ui/Table';
import { useZodForm } from '../ui/useZodForm';
import { NewTokenNotice } from './NewTokenNotice';
import { useCreateToken, useRevokeToken, useTokens, type ApiToken } from './queries';

function RevokeCell({ token }: { token: ApiToken }) {
  const revoke = useRevokeToken();
  if (token.revokedAt) return <span className="text-sm text-ink-soft">Revoked</span>;
  return (
    <ConfirmAction
      size="sm"
      label="Revoke"
      question={`Revoke “${token.name}”? Imports using it stop working.`}
      confirmLabel="Revoke"
      busy={revoke.isPending}
      onConfirm={() => revoke.mutate(token.id)}
      error={revoke.error}
      errorTitle="Not revoked"
    />
  );
}

export function TokenSettings() {
  const tokens = useTokens();
  const create = useCreateToken();
  const { nursery } = useCurrentSession();
  const { register, handleSubmit, formState, reset } = useZodForm(tokenBody, { defaultValues: { name: '' } });
  const at = (iso: string | null) => (iso ? formatInstant(iso, nursery.timeZone) : '—');
  return (
    <Panel title="API tokens" description="For the command-line tool: it imports logger files and reads, and can change nothing else.">
      <div className="flex flex-col gap-6">
        {create.data ? (
          <NewTokenNotice token={create.data} origin={window.location.origin} onDone={() => create.reset()} />
        ) : (
          <form noValidate onSubmit={handleSubmit((body) => create.mutate(body, { onSuccess: () => reset() }))} className="flex flex-col gap-4">
            <Field label="Token name" hint="Where it will be used, e.g. Packing shed PC." error={formState.errors.name?.message}>
              {(c) => <Input {...c} {...register('name')} className="max-w-md" />}
            </Field>
            <FormActions submitLabel="Create token" busyLabel="Creating…" busy={create.isPending} error={create.error} />
          </form>
        )}
        <QueryResult query={tokens} loading="Loading tokens…" failed="Could not load the tokens">
          {(list) =>
            list.length === 0 ? (
              <p className="text-ink-soft">No tokens yet.</p>
            ) : (
              <Table<ApiToken>
                caption="API tokens"
                rows={list}
                rowKey={(t) => t.id}
                columns={[
                  { header: 'Name', cell: (t) => <span className="font-semibold">{t.name}</span> },
                  { header: 'Starts with', cell: (t) => `${t.hint}…`, figure: true },
                  { header: 'Created', cell: (t) => at(t.createdAt), figure: true },
                  { header: 'Last used', cell: (t) => at(t.lastUsedAt), figure: true },
                  { header: 'Status', cell: (t) => <RevokeCell token={t} /> },
                ]}
              />
            )
          }
        </QueryResult>
      </div>
    </Panel>
  );
}
