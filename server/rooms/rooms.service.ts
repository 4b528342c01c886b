import { z } from 'zod';
import { roomBody, roomPatch } from '../../shared/schemas/rooms';
import { conflict, notFound } from '../http/errors';
import { BatchPlacement } from '../batches/batchPlacement.model';
import { LoggerPlacement } from '../loggers/loggerPlacement.model';
import { Room } from './room.model';

export async function listRooms(nurseryId: number) {
  const rooms = await Room.findAll({ where: { nurseryId }, order: [['name', 'ASC']] });
  return rooms.map((r) => r.toPublic());
}

/** Every lookup carries the nursery, so another nursery's id answers 404 exactly like a missing one. */
export async function findRoom(nurseryId: number, id: number) {
  const room = await Room.findOne({ where: { id, nurseryId } });
  if (!room) throw notFound('That room');
  return room;
}

export async function createRoom(nurseryId: number, input: z.output<typeof roomBody>) {
  return (await Room.create({ nurseryId, ...input })).toPublic();
}

export async function updateRoom(nurseryId: number, id: number, patch: z.output<typeof roomPatch>) {
  const room = await findRoom(nurseryId, id);
  return (await room.update(patch)).toPublic();
}

/** A room that ever held a logger or a batch keeps its history; only an unused room can be deleted. */
export async function deleteRoom(nurseryId: number, id: number) {
  const room = await findRoom(nurseryId, id);
  const [loggers, batches] = await Promise.all([LoggerPlacement.count({ where: { roomId: id } }), BatchPlacement.count({ where: { roomId: id } })]);
  if (loggers + batches > 0) {
    throw conflict('room_in_use', 'This room has logger or batch history; rename it or add a note instead of deleting it.');
  }
  await room.destroy();
}
