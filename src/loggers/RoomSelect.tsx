import type { ComponentProps } from 'react';
import type { Room } from '../rooms/queries';
import { Select } from '../ui/Field';

/** The option that takes a logger out of every room; its own value so that "" can mean "nothing chosen yet". */
export const NO_ROOM = 'none';

interface RoomSelectProps extends ComponentProps<'select'> {
  rooms: Room[];
  /** When given, an empty first option asks for a choice instead of meaning "no room". */
  placeholder?: string;
  noRoomLabel: string;
}

export function RoomSelect({ rooms, placeholder, noRoomLabel, ...rest }: RoomSelectProps) {
  return (
    <Select {...rest}>
      {placeholder && <option value="">{placeholder}</option>}
      <option value={placeholder ? NO_ROOM : ''}>{noRoomLabel}</option>
      {rooms.map((room) => (
        <option key={room.id} value={room.id}>
          {room.name}
        </option>
      ))}
    </Select>
  );
}

/** Select value → roomId: a number, null for no room, undefined while nothing is chosen (the schema then asks for one). */
export function readRoomChoice(value: string, emptyMeans: 'no room' | 'unchosen'): number | null | undefined {
  if (value === NO_ROOM) return null;
  if (value === '') return emptyMeans === 'no room' ? null : undefined;
  return Number(value);
}
