import type { Role } from '../../shared/schemas/common';

const look: Record<Role, string> = {
  owner: 'bg-callus-light text-ink',
  staff: 'bg-moss-light text-moss-deep',
  viewer: 'bg-frost text-slate-deep',
};

export function RoleBadge({ role }: { role: Role }) {
  return <span className={`inline-block rounded-full px-2.5 py-0.5 text-sm font-semibold capitalize ${look[role]}`}>{role}</span>;
}
