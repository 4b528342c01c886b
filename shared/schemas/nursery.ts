import { z } from 'zod';
import { ianaZone } from './common';

export const nurseryPatch = z.object({ name: z.string().trim().min(2).max(120), timeZone: ianaZone }).partial();
export const tokenBody = z.object({ name: z.string().trim().min(1, 'Name the token after where it is used').max(80) });
