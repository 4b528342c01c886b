import type { RoomKind } from '../../shared/schemas/rooms';

export function roomKindLabel(kind: RoomKind): string {
  return kind.charAt(0).toUpperCase() + kind.slice(1);
}
