import { z } from 'zod';
import { ianaZone, ROLES, TEMPERATURE_UNITS } from './common';

const email = z.email().max(190).transform((s) => s.trim().toLowerCase());
/** Long passphrases beat composition rules (NIST SP 800-63B §5.1.1): length only, 10 to 200 characters. */
export const password = z.string().min(10, 'Use at least 10 characters').max(200);

export const loginBody = z.object({ email, password: z.string().min(1).max(200) });
export const signupBody = z.object({
  nurseryName: z.string().trim().min(2).max(120),
  name: z.string().trim().min(1).max(120),
  email,
  password,
  timeZone: ianaZone,
});
export const passwordChangeBody = z.object({ currentPassword: z.string().min(1).max(200), newPassword: password });
export const inviteBody = z.object({ email, role: z.enum(ROLES) });
export const acceptInviteBody = z.object({ name: z.string().trim().min(1).max(120), password });
export const inviteTokenParam = z.object({ token: z.string().regex(/^[A-Za-z0-9_-]{20,100}$/) });
export const preferencesBody = z.object({ unit: z.enum(TEMPERATURE_UNITS) });
export const userRoleBody = z.object({ role: z.enum(ROLES) });

export type LoginBody = z.infer<typeof loginBody>;
export type SignupBody = z.infer<typeof signupBody>;
export type InviteBody = z.infer<typeof inviteBody>;
