import type { ComponentProps } from 'react';
import type { Room } from '../rooms/queries';
import { Select } from '../ui/Field';

/** A choice of room with an empty first option ("Choose a room…", "Any room"); a batch is always in some room. */
export function RoomPicker({ rooms, placeholder, ...rest }: ComponentProps<'select'> & { rooms: Room[]; placeholder: string }) {
  return (
    <Select {...rest}>
      <option value="">{placeholder}</option>
      {rooms.map((r) => (
        <option key={r.id} value={r.id}>
          {r.name}
        </option>
      ))}
    </Select>
  );
}

/** Select value → room id, undefined while nothing is chosen (the schema then asks for one). */
export const readRoomId = (value: string) => (value ? Number(value) : undefined);
