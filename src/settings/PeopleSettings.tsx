import { ROLES, type Role } from '../../shared/schemas/common';
import type { SessionUser } from '../auth/queries';
import { useCurrentSession } from '../auth/useCurrentSession';
import { ConfirmAction } from '../ui/ConfirmAction';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Select } from '../ui/Field';
import { Panel } from '../ui/Panel';
import { QueryResult } from '../ui/QueryResult';
import { RoleBadge } from '../ui/RoleBadge';
import { Table } from '../ui/Table';
import { useChangeRole, useRemoveUser, useUsers } from './queries';

/** Your own role is not offered for change: demoting yourself would lock you out of this very page. */
function RoleCell({ person, isSelf }: { person: SessionUser; isSelf: boolean }) {
  const change = useChangeRole();
  if (isSelf) return <RoleBadge role={person.role} />;
  return (
    <div className="flex flex-col gap-1">
      <Select
        aria-label={`Role of ${person.name}`}
        value={change.isPending ? change.variables.role : person.role}
        disabled={change.isPending}
        onChange={(e) => change.mutate({ id: person.id, role: e.target.value as Role })}
        className="w-36 capitalize"
      >
        {ROLES.map((role) => (
          <option key={role} value={role}>
            {role}
          </option>
        ))}
      </Select>
      {change.isError && <ErrorNotice title="Role not changed" error={change.error} />}
    </div>
  );
}

function RemoveCell({ person, isSelf }: { person: SessionUser; isSelf: boolean }) {
  const remove = useRemoveUser();
  if (isSelf) return <span className="text-sm text-ink-soft">That's you</span>;
  return (
    <ConfirmAction
      size="sm"
      label="Remove"
      question={`Remove ${person.name}?`}
      confirmLabel="Remove"
      busy={remove.isPending}
      onConfirm={() => remove.mutate(person.id)}
      error={remove.error}
      errorTitle="Not removed"
    />
  );
}

export function PeopleSettings() {
  const users = useUsers();
  const { user: me } = useCurrentSession();
  return (
    <Panel title="People" description="Everyone who can sign in to this nursery.">
      <QueryResult query={users} loading="Loading people…" failed="Could not load the people">
        {(list) => (
          <Table<SessionUser>
            caption="People"
            rows={list}
            rowKey={(u) => u.id}
            columns={[
              { header: 'Name', cell: (u) => <span className="font-semibold">{u.name}</span> },
              { header: 'E-mail', cell: (u) => <span className="break-all">{u.email}</span> },
              { header: 'Role', cell: (u) => <RoleCell person={u} isSelf={u.id === me.id} /> },
              { header: 'Access', cell: (u) => <RemoveCell person={u} isSelf={u.id === me.id} /> },
            ]}
          />
        )}
      </QueryResult>
    </Panel>
  );
}
