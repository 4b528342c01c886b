import type { Role } from '../../shared/schemas/common';

/** The demo nursery's sign-ins; shown on the sign-in page in demo mode only. */
export const DEMO_PASSWORD = 'coldknit-demo';
export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'owner@example.com', name: 'Wren Halloway', role: 'owner' },
  { email: 'staff@example.com', name: 'Tamsin Orcutt', role: 'staff' },
  { email: 'viewer@example.com', name: 'Ilse Varnum', role: 'viewer' },
];
