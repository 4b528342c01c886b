import type { Role } from '../../shared/schemas/common';

/** Plain words for what each role may do, shown wherever a role is chosen. */
export const ROLE_DESCRIPTIONS: Record<Role, string> = {
  owner: 'Everything, including people, API tokens and nursery settings',
  staff: 'Adds and edits rooms, loggers and records',
  viewer: 'Reads everything, changes nothing',
};
