import { describe, expect, it } from 'vitest';
import { getSpeciesProfile } from '../../../shared/species/profiles';
import { applyProfilePatch } from '../../../server/profiles/profiles.service';

const PEAR = structuredClone(getSpeciesProfile('pear')!);

describe('applyProfilePatch', () => {
  it('changes what the patch names and keeps the rest with its citations', () => {
    const next = applyProfilePatch({ ...PEAR, key: 'pear-2' }, { callus: { optLowC: 12 }, name: 'Pear, north bench' }, '2026-12-01');
    expect(next.callus).toEqual({ ...PEAR.callus, optLowC: 12 });
    expect(next.name).toBe('Pear, north bench');
    expect(next.sources['callus.optLowC']).toBe("[NURSERY] This nursery's own value, set on 2026-12-01 (was 13).");
    expect(next.sources['callus.optHighC']).toBe(PEAR.sources['callus.optHighC']);
  });

  it('keeps a source given with the change, and marks a storage maximum removed', () => {
    const next = applyProfilePatch({ ...PEAR, key: 'pear-2' }, { storageMaxC: null, sources: { freezeC: 'Re-checked, unchanged.' } }, '2026-12-01');
    expect(next.storageMaxC).toBeNull();
    expect(next.sources.storageMaxC).toMatch(/^\[NURSERY\].*\(was 10\)\.$/);
    expect(next.sources.freezeC).toBe('Re-checked, unchanged.');
  });

  it('throws the shared schema\'s error for an impossible profile', () => {
    expect(() => applyProfilePatch({ ...PEAR, key: 'pear-2' }, { callus: { optLowC: -1 } }, '2026-12-01')).toThrow(/callus base/);
  });
});
