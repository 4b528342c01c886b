import type { z } from 'zod';
import { DEFAULT_THRESHOLDS, nurseryThresholds, type ThresholdOverrides } from '../../shared/alerts/thresholds';
import type { nurseryThresholdsPatch, roomThresholdsPatch } from '../../shared/schemas/alerts';
import { findRoom } from '../rooms/rooms.service';
import { AlertSetting } from './alertSetting.model';

/** The nursery's stored overrides and each room's, as the rules take them. */
export async function loadOverrides(nurseryId: number): Promise<ThresholdOverrides> {
  const rows = await AlertSetting.findAll({ where: { nurseryId } });
  const nursery = rows.find((r) => r.roomId === null)?.thresholds ?? {};
  const rooms = new Map(rows.filter((r) => r.roomId !== null).map((r) => [r.roomId!, r.thresholds]));
  return { nursery, rooms };
}

/** What the settings page shows: defaults, the nursery's overrides and effective values, and each room's overrides. */
export async function getAlertSettings(nurseryId: number) {
  const overrides = await loadOverrides(nurseryId);
  return {
    defaults: DEFAULT_THRESHOLDS,
    nursery: overrides.nursery,
    effective: nurseryThresholds(overrides),
    rooms: [...overrides.rooms].map(([roomId, thresholds]) => ({ roomId, thresholds })),
  };
}

type Patch = z.output<typeof nurseryThresholdsPatch> | z.output<typeof roomThresholdsPatch>;

/** Sets some overrides of one scope and drops others (they inherit again); a scope left with none is deleted. */
async function patchScope(nurseryId: number, roomId: number | null, patch: Patch, userId: number | null) {
  const existing = await AlertSetting.findOne({ where: { nurseryId, roomId } });
  const thresholds: Record<string, unknown> = { ...(existing?.thresholds ?? {}), ...patch.set };
  for (const key of patch.reset) delete thresholds[key];
  if (!Object.keys(thresholds).length) await existing?.destroy();
  else if (existing) await existing.update({ thresholds, updatedBy: userId });
  else await AlertSetting.create({ nurseryId, roomId, thresholds, updatedBy: userId });
}

export async function patchNurseryThresholds(nurseryId: number, patch: z.output<typeof nurseryThresholdsPatch>, userId: number | null) {
  await patchScope(nurseryId, null, patch, userId);
  return getAlertSettings(nurseryId);
}

export async function patchRoomThresholds(nurseryId: number, roomId: number, patch: z.output<typeof roomThresholdsPatch>, userId: number | null) {
  await findRoom(nurseryId, roomId);
  await patchScope(nurseryId, roomId, patch, userId);
  return getAlertSettings(nurseryId);
}

/** Drops every override of a room: it follows the nursery's thresholds again. */
export async function clearRoomThresholds(nurseryId: number, roomId: number) {
  await findRoom(nurseryId, roomId);
  await AlertSetting.destroy({ where: { nurseryId, roomId } });
}
