// Built-in species profiles against REFERENCES (/work/shared/REFERENCES.md), each check labelled with the
// row's confidence tag: [PUB] published, [PUB-2] secondary quotation, [PRACT] common practice, [MEM] from
// memory, [DESIGN] our choice. Plus the schema that guards owners' edited copies.
import { describe, expect, it } from 'vitest';
import { callusRate, computeExposure } from '../../../shared/exposure';
import { getSpeciesProfile, SOURCED_FIELDS, SPECIES_PROFILES, speciesProfileSchema, type SpeciesProfile } from '../../../shared/species/profiles';
import { fahrenheitToCelsius } from '../../../shared/units';

const HOUR = 3_600_000;
const TAG = /\[(PUB|PUB-2|PRACT|MEM|CALC|DESIGN)\]/;

function profile(key: string): SpeciesProfile {
  const found = getSpeciesProfile(key);
  if (!found) throw new Error(`no built-in profile "${key}"`);
  return found;
}

/** Callus progress after holding a constant temperature for some days. */
function progressAfter(p: SpeciesProfile, c: number, days: number): number {
  const readings = [
    { t: 0, c },
    { t: days * 24 * HOUR, c },
  ];
  const e = computeExposure(readings, { band: p.band, freezeC: p.freezeC, maxGapMinutes: days * 24 * 60, callus: p.callus });
  return e.callus!.progressPct;
}

describe('the built-in set', () => {
  it('covers the required species (pecan too)', () => {
    const keys = SPECIES_PROFILES.map((p) => p.key);
    for (const key of ['apple', 'pear', 'quince', 'peach', 'plum', 'apricot', 'cherry', 'walnut', 'chestnut', 'hazelnut', 'grape', 'persimmon', 'fig', 'pecan']) {
      expect(keys).toContain(key);
    }
    expect(new Set(keys).size).toBe(keys.length);
  });

  it.each(SPECIES_PROFILES.map((p) => [p.key, p]))('%s passes its own schema', (_key, p) => {
    expect(speciesProfileSchema.safeParse(p).success).toBe(true);
  });

  it.each(SPECIES_PROFILES.map((p) => [p.key, p]))('%s: every number has a cited, tagged source', (_key, p) => {
    for (const field of SOURCED_FIELDS) {
      const source = p.sources[field];
      expect(source, `${p.key} ${field}`).toMatch(TAG);
      expect(source, `${p.key} ${field}`).toMatch(/REFERENCES (§|opening trade facts)|\[DESIGN\]/);
    }
  });

  it('getSpeciesProfile finds by key and returns null for an unknown one', () => {
    expect(getSpeciesProfile('walnut')?.name).toBe('Walnut');
    expect(getSpeciesProfile('mango')).toBeNull();
  });

  it('built-ins are frozen; a structuredClone is editable and still validates', () => {
    const apple = profile('apple');
    expect(() => {
      (apple.band as { minC: number }).minC = 5;
    }).toThrow(TypeError);
    const copy = structuredClone(apple);
    copy.band.maxC = 6;
    expect(speciesProfileSchema.parse(copy).band.maxC).toBe(6);
  });
});

describe('freeze limits — REFERENCES §3 derived row (warn ≤ 0 °C, alarm ≤ −2 °C for unfrozen grafts) [DESIGN]', () => {
  it.each(SPECIES_PROFILES.map((p) => [p.key, p]))('%s alarms at −2 °C', (_key, p) => {
    expect(p.freezeC).toBe(-2);
  });

  it('the apple band starts at the 0 °C warning point — REFERENCES §3 [DESIGN]', () => {
    expect(profile('apple').band.minC).toBe(0);
  });
});

describe('pome fruit: cold storage', () => {
  it('apple/pear band contains the USDA FS unfrozen-stock set-point 0.6–1.1 °C (33–34 °F) — REFERENCES §2 [PUB]', () => {
    for (const key of ['apple', 'pear']) {
      const { band } = profile(key);
      expect(band.minC).toBeLessThanOrEqual(fahrenheitToCelsius(33));
      expect(band.maxC).toBeGreaterThanOrEqual(fahrenheitToCelsius(34));
    }
  });

  it('apple/pear band contains the 35–40 °F practice band — REFERENCES trade facts [PRACT]', () => {
    for (const key of ['apple', 'pear']) {
      const { band } = profile(key);
      expect(band.minC).toBeLessThanOrEqual(fahrenheitToCelsius(35));
      expect(band.maxC).toBeGreaterThanOrEqual(fahrenheitToCelsius(40));
    }
  });

  it('apple band top is 45 °F = 7.2222 °C, the top of H&K\'s "very slow" 0–7 °C (32–45 °F) — REFERENCES §1a [PUB-2]/[MEM]', () => {
    expect(profile('apple').band.maxC).toBeCloseTo(7.2222, 4);
  });

  it('apple too-warm limit is 50 °F = 10 °C, top of H&K\'s 7–10 °C "slow callusing" storage band — REFERENCES §1a [PUB-2]', () => {
    expect(profile('apple').storageMaxC).toBe(10);
  });

  it('apple/pear optimum 13–18 °C — gb-online 2013 and growingfruit t/70053, REFERENCES §1a [PRACT]', () => {
    for (const key of ['apple', 'pear']) {
      expect([profile(key).callus.optLowC, profile(key).callus.optHighC]).toEqual([13, 18]);
    }
  });

  it('apple: little or no callus at 0 °C — H&K, REFERENCES §1a [MEM]; rate 0 above 32 °C ("retarded") [PUB-2]', () => {
    const apple = profile('apple');
    expect(callusRate(apple.callus, 0)).toBe(0);
    expect(callusRate(apple.callus, 32)).toBe(0);
  });

  it('apple/pear calluses slowly in cold storage at 35–40 °F — REFERENCES trade facts [PRACT]', () => {
    const rate = callusRate(profile('apple').callus, fahrenheitToCelsius(38));
    expect(rate).toBeGreaterThan(0);
    expect(rate).toBeLessThan(0.5);
  });

  it('apple: 14 d at optimum = 100 % — Raintree 2019, 10–14 d at 15.6–21 °C, REFERENCES §2 [PRACT]/[DESIGN]', () => {
    expect(profile('apple').callus.hoursAtOptimum).toBe(336);
    expect(progressAfter(profile('apple'), 15.6, 14)).toBeCloseTo(100, 9);
  });

  it('quince range 13–30 °C — growingfruit t/70053, REFERENCES §1a [PRACT]', () => {
    expect([profile('quince').callus.optLowC, profile('quince').callus.upperC]).toEqual([13, 30]);
  });
});

describe('stone fruit: kept warm to callus', () => {
  it.each(['peach', 'plum', 'apricot', 'cherry'])('%s has no cold-storage maximum [DESIGN]', (key) => {
    expect(profile(key).storageMaxC).toBeNull();
  });

  it('peach optimum 18–26 °C — gb-online 2013, REFERENCES §1b [PRACT]; Fackler ≈21 °C needed lies inside [PRACT]', () => {
    const { callus } = profile('peach');
    expect([callus.optLowC, callus.optHighC]).toEqual([18, 26]);
    expect(callusRate(callus, 21)).toBe(1);
  });

  it('peach calluses poorly below 60 °F = 15.5556 °C — REFERENCES trade facts [PRACT]', () => {
    expect(profile('peach').callus.baseC).toBeCloseTo(15.5556, 4);
  });

  it('apricot and cherry optimum 20 °C — gb-online 2013, REFERENCES §1b [PRACT]', () => {
    for (const key of ['apricot', 'cherry']) expect(callusRate(profile(key).callus, 20)).toBe(1);
  });

  it('plum optimum from 16 °C — gb-online 2013, REFERENCES §1b [PRACT]; band 60–80 °F — t/14973 [PRACT]', () => {
    const plum = profile('plum');
    expect(plum.callus.optLowC).toBe(16);
    expect(plum.band.minC).toBeCloseTo(15.5556, 4);
    expect(plum.band.maxC).toBeCloseTo(26.6667, 4);
  });

  it('no tissue-damaging heat counted as progress: rate 0 at 30 °C — gb-online 2013, REFERENCES §1b [PRACT]', () => {
    for (const key of ['peach', 'plum', 'apricot', 'cherry']) expect(callusRate(profile(key).callus, 30)).toBe(0);
  });
});

describe('nut trees and other warm-callused species', () => {
  it('walnut optimum includes 27 °C — Gandev 2009 [PUB]; Avanzato & Atefi 1997 [PUB]', () => {
    expect(callusRate(profile('walnut').callus, 27)).toBe(1);
  });

  it('walnut optimum 26–29 °C — Paunović et al. 2010 stratification rooms, REFERENCES §1c [PUB]', () => {
    const { callus } = profile('walnut');
    expect([callus.optLowC, callus.optHighC]).toEqual([26, 29]);
  });

  it('walnut: 25 days at optimum = 100 % — van Zyl 2009 "more than sufficient" [PUB]; Gandev 2009 4 weeks at 27 °C [PUB] exceeds it', () => {
    const walnut = profile('walnut');
    expect(progressAfter(walnut, 27, 25)).toBeCloseTo(100, 9);
    expect(progressAfter(walnut, 27, 28)).toBeGreaterThan(100);
  });

  it('walnut: 18 °C gives low callus — growingfruit t/70053, REFERENCES §1c [PRACT]', () => {
    const rate = callusRate(profile('walnut').callus, 18);
    expect(rate).toBeGreaterThan(0);
    expect(rate).toBeLessThan(0.5);
  });

  it('chestnut optimum up to 26–27 °C at the graft point — doi 10.2478/agr-2025-0008, REFERENCES §1c [PUB]', () => {
    expect(callusRate(profile('chestnut').callus, 26.5)).toBe(1);
  });

  it('chestnut: high callus after 9 d at 23–24 °C — growingfruit t/70053, REFERENCES §1c [PRACT]', () => {
    expect(progressAfter(profile('chestnut'), 23.5, 9)).toBeCloseTo(100, 9);
  });

  it('hazelnut optimum 22–24 °C — Humphrey 2019, REFERENCES §1c [PUB]', () => {
    const { callus } = profile('hazelnut');
    expect([callus.optLowC, callus.optHighC]).toEqual([22, 24]);
  });

  it('grape optimum 24–27 °C, none below ≈15.6 °C (60 °F) — H&K via t/9735, REFERENCES §1d [PUB-2]/[MEM]', () => {
    const { callus, band } = profile('grape');
    expect([callus.optLowC, callus.optHighC]).toEqual([24, 27]);
    expect(callus.baseC).toBeCloseTo(15.5556, 4);
    expect(band.maxC).toBe(29);
  });

  it('grape still calluses at 29.5 °C — Alley & Peterson 1977, REFERENCES §1d [PUB]', () => {
    expect(callusRate(profile('grape').callus, 29.5)).toBeGreaterThan(0);
  });

  it('persimmon: growth almost stopped at ≈10 °C, optimum 75–85 °F, too hot above 32 °C — t/19333, REFERENCES §1d [PRACT]', () => {
    const { callus } = profile('persimmon');
    expect(callus.baseC).toBe(10);
    expect(callus.optLowC).toBeCloseTo(23.8889, 4);
    expect(callus.optHighC).toBeCloseTo(29.4444, 4);
    expect(callus.upperC).toBe(32);
  });

  it('fig 23.9–29.4 °C (75–85 °F) — growingfruit t/68316, REFERENCES §1d [PRACT]', () => {
    const { band } = profile('fig');
    expect(band.minC).toBeCloseTo(23.9, 1);
    expect(band.maxC).toBeCloseTo(29.4, 1);
  });

  it('pecan hot pipe 26–28 °C — t/42763 [PRACT]; above 32 °C "cooks" a new graft — W. Reid, REFERENCES §1c [PRACT]', () => {
    const pecan = profile('pecan');
    expect([pecan.band.minC, pecan.band.maxC]).toEqual([26, 28]);
    expect(callusRate(pecan.callus, 32)).toBe(0);
  });
});

describe('speciesProfileSchema rejects inconsistent edits', () => {
  const valid = () => structuredClone(profile('apple'));

  it.each<[string, (p: SpeciesProfile) => void, string]>([
    ['band min not below max', (p) => (p.band.minC = p.band.maxC), 'band'],
    ['base not below optimum low', (p) => (p.callus.baseC = p.callus.optLowC), 'callus'],
    ['optimum low above optimum high', (p) => (p.callus.optLowC = p.callus.optHighC + 1), 'callus'],
    ['optimum high not below upper', (p) => (p.callus.upperC = p.callus.optHighC), 'callus'],
    ['hoursAtOptimum zero', (p) => (p.callus.hoursAtOptimum = 0), 'callus.hoursAtOptimum'],
    ['freeze limit inside the band', (p) => (p.freezeC = 1), 'freezeC'],
    ['storage maximum below the band maximum', (p) => (p.storageMaxC = 5), 'storageMaxC'],
    ['an empty source', (p) => (p.sources['band.minC'] = ' '), 'sources.band.minC'],
    ['a bad key', (p) => (p.key = 'Apple Tree'), 'key'],
  ])('%s', (_what, edit, path) => {
    const p = valid();
    edit(p);
    const result = speciesProfileSchema.safeParse(p);
    expect(result.success).toBe(false);
    expect(result.error?.issues.map((i) => i.path.join('.'))).toContain(path);
  });

  it('rejects a missing source and a non-number', () => {
    const p = valid() as unknown as Record<string, unknown>;
    delete (p.sources as Record<string, string>)['callus.upperC'];
    p.freezeC = '-2';
    const paths = speciesProfileSchema.safeParse(p).error?.issues.map((i) => i.path.join('.'));
    expect(paths).toEqual(expect.arrayContaining(['sources.callus.upperC', 'freezeC']));
  });

  it('accepts equal optimum ends (a single optimum temperature)', () => {
    const p = valid();
    p.callus.optHighC = p.callus.optLowC;
    expect(speciesProfileSchema.safeParse(p).success).toBe(true);
  });
});
