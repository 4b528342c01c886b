// The engine settings a species profile stands for, and a key under which profiles with equal settings share work.
import type { ExposureOptions } from '../../shared/exposure';
import type { SpeciesProfile } from '../../shared/species/schema';

export type EngineOptions = Omit<ExposureOptions, 'from' | 'to'>;

export const engineOptions = (profile: SpeciesProfile): EngineOptions => ({
  band: profile.band,
  freezeC: profile.freezeC,
  callus: profile.callus,
});

/** Profiles with the same numbers (apple and pear, say) give the same figures: one pass over the readings serves both. */
export const engineKey = (profile: SpeciesProfile): string => JSON.stringify(engineOptions(profile));
