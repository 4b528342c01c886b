import { Sequelize as SequelizeFns } from 'sequelize';
import type { z } from 'zod';
import { SOURCED_FIELDS, speciesProfileSchema, type SourcedField, type SpeciesProfile } from '../../shared/species/schema';
import { getSpeciesProfile, SPECIES_PROFILES } from '../../shared/species/profiles';
import type { profileCopyBody, ProfilePatch } from '../../shared/schemas/profiles';
import { Batch } from '../batches/batch.model';
import { conflict, notFound } from '../http/errors';
import { NurseryProfile } from './nurseryProfile.model';

export type ProfileOrigin = 'built-in' | 'nursery';

function present(profile: SpeciesProfile, origin: ProfileOrigin, basedOn: string | null, updatedAt: Date | null, batchCount: number) {
  return { ...profile, origin, basedOn, updatedAt, batchCount };
}

async function batchCounts(nurseryId: number): Promise<Map<string, number>> {
  const rows = (await Batch.findAll({
    where: { nurseryId },
    attributes: ['speciesKey', [SequelizeFns.fn('COUNT', SequelizeFns.col('id')), 'n']],
    group: ['speciesKey'],
    raw: true,
  })) as unknown as { speciesKey: string; n: number }[];
  return new Map(rows.map((r) => [r.speciesKey, Number(r.n)]));
}

/** Built-in profiles first (read-only), then the nursery's own, each saying which it is. */
export async function listProfiles(nurseryId: number) {
  const [own, counts] = await Promise.all([NurseryProfile.findAll({ where: { nurseryId }, order: [['name', 'ASC']] }), batchCounts(nurseryId)]);
  return [
    ...SPECIES_PROFILES.map((p) => present(p, 'built-in', null, null, counts.get(p.key) ?? 0)),
    ...own.map((p) => present(p.toProfile(), 'nursery', p.basedOn, p.updatedAt, counts.get(p.key) ?? 0)),
  ];
}

/** Every profile a batch of this nursery may use, by key. */
export async function profilesOf(nurseryId: number): Promise<Map<string, SpeciesProfile>> {
  const own = await NurseryProfile.findAll({ where: { nurseryId } });
  return new Map<string, SpeciesProfile>([...SPECIES_PROFILES.map((p) => [p.key, p] as const), ...own.map((p) => [p.key, p.toProfile()] as const)]);
}

async function findOwn(nurseryId: number, key: string) {
  return NurseryProfile.findOne({ where: { nurseryId, key } });
}

/** A built-in profile or one of the nursery's, or 404. */
export async function findProfile(nurseryId: number, key: string): Promise<SpeciesProfile> {
  const profile = getSpeciesProfile(key) ?? (await findOwn(nurseryId, key))?.toProfile();
  if (!profile) throw notFound(`The species profile "${key}"`);
  return profile;
}

async function findEditable(nurseryId: number, key: string) {
  if (getSpeciesProfile(key)) {
    throw conflict('built_in_profile', 'Built-in profiles cannot be changed or removed; copy it under a new key and edit the copy.');
  }
  const own = await findOwn(nurseryId, key);
  if (!own) throw notFound(`The species profile "${key}"`);
  return own;
}

export async function copyProfile(nurseryId: number, input: z.output<typeof profileCopyBody>) {
  const source = await findProfile(nurseryId, input.from);
  if (getSpeciesProfile(input.key) || (await findOwn(nurseryId, input.key))) {
    throw conflict('profile_key_taken', `There is already a profile with the key "${input.key}".`);
  }
  const basedOn = getSpeciesProfile(source.key) ? source.key : (await findOwn(nurseryId, source.key))!.basedOn;
  const profile = speciesProfileSchema.parse({ ...structuredClone(source), key: input.key, name: input.name });
  const made = await NurseryProfile.create({ nurseryId, basedOn, ...NurseryProfile.columnsOf(profile) });
  return present(made.toProfile(), 'nursery', made.basedOn, made.updatedAt, 0);
}

const valueAt = (p: SpeciesProfile, field: SourcedField): number | null => {
  const [group, name] = field.split('.') as [string, string | undefined];
  const holder = p as unknown as Record<string, unknown>;
  return (name ? (holder[group] as Record<string, number>)[name] : holder[group]) as number | null;
};

/**
 * Merges the patch and validates the whole profile with the shared schema. A number that changed without a new
 * source is labelled as the nursery's own value: the old citation no longer describes it.
 */
export function applyProfilePatch(current: SpeciesProfile, patch: ProfilePatch, today: string): SpeciesProfile {
  const next = {
    ...current,
    ...(patch.name !== undefined && { name: patch.name }),
    ...(patch.freezeC !== undefined && { freezeC: patch.freezeC }),
    ...(patch.storageMaxC !== undefined && { storageMaxC: patch.storageMaxC }),
    band: { ...current.band, ...patch.band },
    callus: { ...current.callus, ...patch.callus },
    sources: { ...current.sources },
  };
  for (const field of SOURCED_FIELDS) {
    const before = valueAt(current, field);
    const after = valueAt(next, field);
    if (patch.sources?.[field]) next.sources[field] = patch.sources[field];
    else if (before !== after) next.sources[field] = `[NURSERY] This nursery's own value, set on ${today} (was ${before ?? 'none'}).`;
  }
  return speciesProfileSchema.parse(next);
}

export async function updateProfile(nurseryId: number, key: string, patch: ProfilePatch) {
  const own = await findEditable(nurseryId, key);
  const next = applyProfilePatch(own.toProfile(), patch, new Date().toISOString().slice(0, 10));
  await own.update(NurseryProfile.columnsOf(next));
  const counts = await batchCounts(nurseryId);
  return present(own.toProfile(), 'nursery', own.basedOn, own.updatedAt, counts.get(key) ?? 0);
}

export async function deleteProfile(nurseryId: number, key: string) {
  const own = await findEditable(nurseryId, key);
  const used = await Batch.count({ where: { nurseryId, speciesKey: key } });
  if (used > 0) throw conflict('profile_in_use', `${used} batch${used === 1 ? ' uses' : 'es use'} this profile; move them to another profile first.`);
  await own.destroy();
}
