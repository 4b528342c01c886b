import { z } from 'zod';

export const ROOM_KINDS = ['basement', 'garage', 'cellar', 'back room', 'fridge', 'outdoors', 'other'] as const;
export type RoomKind = (typeof ROOM_KINDS)[number];

export const roomBody = z.object({
  name: z.string().trim().min(1, 'Give the room a name').max(120),
  kind: z.enum(ROOM_KINDS),
  notes: z.string().max(2000).default(''),
});
export const roomPatch = roomBody.partial();
export type RoomInput = z.input<typeof roomBody>;
