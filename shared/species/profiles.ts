// Built-in species profiles. Every number carries a citation from /work/shared/REFERENCES.md ("REFERENCES §…")
// with its confidence tag — [PUB] published, [PUB-2] secondary quotation, [PRACT] common practice,
// [MEM] from memory — or [DESIGN] where it is our own choice, with the reason.
import { fahrenheitToCelsius } from '../units';
import { speciesProfileSchema, type SpeciesProfile } from './schema';

export { speciesProfileSchema, SOURCED_FIELDS, type SpeciesProfile, type SourcedField } from './schema';

const FREEZE_ALARM_C = -2;
const FREEZE_SOURCE =
  'REFERENCES §3 last row [DESIGN], derived from §2 USDA FS "Basic Storage Principles" [PUB] (unfrozen stock kept "as near to ' +
  'freezing as possible without freezing"; a hard freeze damages roots) and Raintree 2019 [PRACT] (a hard freeze can damage new ' +
  'union cells): warn at ≤ 0 °C, alarm at ≤ −2 °C for unfrozen grafts. No source gives a species-specific figure for fresh unions.';

/** Below this the warm-callused species are taken to make no callus (rate 0). */
const WARM_BASE_C = fahrenheitToCelsius(60);
const STONE_FRUIT_BASE_SOURCE =
  'REFERENCES opening trade facts: "peach and other stone fruit callus poorly below about 60 °F (15.6 °C)" [PRACT]; §1b growingfruit t/14973 ' +
  'peaches/plums 60–80 °F [PRACT]. Rate taken as 0 there [DESIGN].';
const NO_WARM_BASE_SOURCE =
  '[DESIGN] No minimum found in REFERENCES for this species; 60 °F (15.6 °C), where the trade says stone fruit stop callusing ' +
  '(REFERENCES opening trade facts [PRACT]), is used for every warm-callused species without its own figure.';

const TISSUE_DAMAGE_C = 30;
const TISSUE_DAMAGE_SOURCE = 'REFERENCES §1b gb-online 2013: "tissue damage … over 30 °C (86 °F)" for all temperate fruit [PRACT]';

const HOT_UPPER_C = 32;
const HOT_UPPER_SOURCE =
  '[DESIGN] Rate 0 at 32 °C: REFERENCES §1c W. Reid (pecan): above 32 °C (90 °F) heat can "cook" a new graft [PRACT]; §1d ' +
  'growingfruit t/19333 (persimmon): above 32 °C too hot [PRACT]; §1a H&K via t/9735 (apple): callusing "retarded" above 32 °C [PUB-2].';

const NOT_COLD_STORED_SOURCE =
  '[DESIGN] null: kept warm to callus (REFERENCES opening trade facts: stone fruit and nut trees need warmth [PRACT]); the band maximum already ' +
  'flags too much heat, and "too warm for cold storage" does not apply.';

/** Raintree 2019's bench-graft figure is the only callusing duration in REFERENCES for temperate fruit. */
const BENCH_GRAFT_HOURS = 14 * 24;
const BENCH_GRAFT_HOURS_SOURCE =
  'REFERENCES §2 Raintree 2019: callus 10–14 d at 15.6–21 °C (60–70 °F) [PRACT]. We take 14 d = 336 h [DESIGN]: part of that range ' +
  'lies above the optimum, and a late estimate is safer than moving grafts out before the union holds.';

/** Walnut's published hot-callus duration, reused for nut trees and persimmon that lack their own. */
const HOT_CALLUS_HOURS = 25 * 24;
const WALNUT_HOURS_SOURCE =
  'REFERENCES §1c van Zyl 2009: 25 days of heating "more than sufficient" [PUB]; Gandev 2009: 4 weeks at 27 °C [PUB]. We take ' +
  '25 d = 600 h [DESIGN]: full callus comes no later than van Zyl found, and Gandev\'s 4 weeks is a schedule with margin.';

// Apple, pear and quince share cold storage: the pome-fruit storage figures below.
const POME_BAND_MIN_C = 0;
const POME_BAND_MIN_SOURCE =
  'REFERENCES §2 USDA FS "Basic Storage Principles": 0–1.1 °C, "as near to freezing as possible without freezing" [PUB]; §3: warn at ' +
  '≤ 0 °C [DESIGN]. The 35–40 °F practice band would flag USDA\'s own 0.6–1.1 °C set-point as too cold, so the band starts at 0 °C.';
const POME_BAND_MAX_C = fahrenheitToCelsius(45);
const POME_BAND_MAX_SOURCE =
  'REFERENCES §1a H&K via growingfruit t/9735: 0–7 °C (32–45 °F) callusing "very slow" [PUB-2]/[MEM]; §2 Raintree 2019: hold at ' +
  '35–45 °F until hard-freeze risk passes [PRACT]; Cummins: "a 45 °F room for 6 weeks works well" [PRACT]. Band top 45 °F [DESIGN].';
const POME_STORAGE_MAX_C = fahrenheitToCelsius(50);
const POME_STORAGE_MAX_SOURCE =
  'REFERENCES §1a H&K via t/9735: 7–10 °C (45–50 °F) "slow callusing", yet usable for long cool storage [PUB-2]; above it growth ' +
  'speeds up and buds push (§2 growingfruit t/60832: grafts held at 40–55 °F "until buds push" [PRACT]). Limit 50 °F [DESIGN].';
const POME_OPTIMUM_SOURCE =
  'REFERENCES §1a gb-online 2013: "optimum" 13–18 °C for apples and pears [PRACT]; growingfruit t/70053: Malus optimum 13–18 °C [PRACT]';
const POME_BASE_SOURCE =
  'REFERENCES §1a H&K: below 0 °C little or no callus [MEM]; sonneruplund.dk: ≈0 °C no callus, slight callus at 3–5 °C [PRACT]';
const POME_UPPER_SOURCE =
  'REFERENCES §1a H&K via t/9735: callusing "retarded" above 32 °C (90 °F) [PUB-2]; rate taken as 0 there [DESIGN] (§1b gb-online: ' +
  'tissue damage over 30 °C [PRACT]).';

const POME_STORAGE = {
  freezeC: FREEZE_ALARM_C,
  band: { minC: POME_BAND_MIN_C, maxC: POME_BAND_MAX_C },
  storageMaxC: POME_STORAGE_MAX_C,
};
const POME_STORAGE_SOURCES = {
  freezeC: FREEZE_SOURCE,
  'band.minC': POME_BAND_MIN_SOURCE,
  'band.maxC': POME_BAND_MAX_SOURCE,
  storageMaxC: POME_STORAGE_MAX_SOURCE,
};

type WarmCallusedParts = Omit<SpeciesProfile, 'freezeC' | 'storageMaxC' | 'sources'> & {
  sources: Omit<SpeciesProfile['sources'], 'freezeC' | 'storageMaxC'>;
};

/** Species kept warm to callus: the common freeze alarm, and no cold-storage maximum. */
function warmCallused({ sources, ...parts }: WarmCallusedParts): SpeciesProfile {
  return {
    ...parts,
    freezeC: FREEZE_ALARM_C,
    storageMaxC: null,
    sources: { ...sources, freezeC: FREEZE_SOURCE, storageMaxC: NOT_COLD_STORED_SOURCE },
  };
}

// Apricot and cherry: one published optimum of 20 °C (gb-online lists them together).
const WARM_20C_SETTINGS = {
  band: { minC: 18, maxC: 27 },
  callus: { baseC: WARM_BASE_C, optLowC: 20, optHighC: 20, upperC: TISSUE_DAMAGE_C, hoursAtOptimum: BENCH_GRAFT_HOURS },
};
const WARM_20C_OPTIMUM_SOURCE =
  'REFERENCES §1b gb-online 2013: apricot/cherry 20 °C (68 °F) [PRACT]; growingfruit t/70053: apricot optimum 20 °C [PRACT]. One ' +
  'value, so the rate peaks there [DESIGN].';
const WARM_20C_SOURCES = {
  'callus.baseC': STONE_FRUIT_BASE_SOURCE,
  'callus.optLowC': WARM_20C_OPTIMUM_SOURCE,
  'callus.optHighC': WARM_20C_OPTIMUM_SOURCE,
  'callus.upperC': TISSUE_DAMAGE_SOURCE,
  'callus.hoursAtOptimum': `${BENCH_GRAFT_HOURS_SOURCE} No stone-fruit duration found, so the bench-graft figure is used [DESIGN].`,
};

const PROFILES: SpeciesProfile[] = [
  {
    key: 'apple',
    name: 'Apple',
    ...POME_STORAGE,
    callus: { baseC: 0, optLowC: 13, optHighC: 18, upperC: 32, hoursAtOptimum: BENCH_GRAFT_HOURS },
    sources: {
      ...POME_STORAGE_SOURCES,
      'callus.baseC': POME_BASE_SOURCE,
      'callus.optLowC': POME_OPTIMUM_SOURCE,
      'callus.optHighC': POME_OPTIMUM_SOURCE,
      'callus.upperC': POME_UPPER_SOURCE,
      'callus.hoursAtOptimum': BENCH_GRAFT_HOURS_SOURCE,
    },
  },
  {
    key: 'pear',
    name: 'Pear',
    ...POME_STORAGE,
    callus: { baseC: 0, optLowC: 13, optHighC: 18, upperC: 32, hoursAtOptimum: BENCH_GRAFT_HOURS },
    sources: {
      ...POME_STORAGE_SOURCES,
      'callus.baseC': `${POME_BASE_SOURCE}. H&K's figures are for apple; pear "has the widest tolerance" (REFERENCES §1a NAFEX 2007 [PRACT]), so apple's limits are on the safe side [DESIGN].`,
      'callus.optLowC': POME_OPTIMUM_SOURCE,
      'callus.optHighC': POME_OPTIMUM_SOURCE,
      'callus.upperC': `${POME_UPPER_SOURCE} Apple's figure used for pear [DESIGN].`,
      'callus.hoursAtOptimum': BENCH_GRAFT_HOURS_SOURCE,
    },
  },
  {
    key: 'quince',
    name: 'Quince',
    ...POME_STORAGE,
    callus: { baseC: 0, optLowC: 13, optHighC: 18, upperC: TISSUE_DAMAGE_C, hoursAtOptimum: BENCH_GRAFT_HOURS },
    sources: {
      ...POME_STORAGE_SOURCES,
      'callus.baseC': `${POME_BASE_SOURCE}. Apple's figure used [DESIGN]: REFERENCES §8 found no primary quince data; quince is a pome stored like pear.`,
      'callus.optLowC': 'REFERENCES §1a growingfruit t/70053: Cydonia range 13–30 °C, lower end [PRACT]',
      'callus.optHighC': `[DESIGN] t/70053 gives quince no optimum; the apple/pear optimum's top is used. ${POME_OPTIMUM_SOURCE}`,
      'callus.upperC': `REFERENCES §1a growingfruit t/70053: Cydonia range 13–30 °C, upper end [PRACT]; ${TISSUE_DAMAGE_SOURCE}`,
      'callus.hoursAtOptimum': BENCH_GRAFT_HOURS_SOURCE,
    },
  },
  warmCallused({
    key: 'peach',
    name: 'Peach / nectarine',
    band: { minC: 18, maxC: 27 },
    callus: { baseC: WARM_BASE_C, optLowC: 18, optHighC: 26, upperC: TISSUE_DAMAGE_C, hoursAtOptimum: BENCH_GRAFT_HOURS },
    sources: {
      'band.minC': 'REFERENCES §1b growingfruit t/70053: P. persica 18–27 °C [PRACT]',
      'band.maxC': 'REFERENCES §1b growingfruit t/70053: P. persica 18–27 °C [PRACT]',
      'callus.baseC': STONE_FRUIT_BASE_SOURCE,
      'callus.optLowC': 'REFERENCES §1b gb-online 2013: peach/nectarine optimum 18–26 °C [PRACT]; Fackler ≈21 °C needed [PRACT] lies inside',
      'callus.optHighC': 'REFERENCES §1b gb-online 2013: peach/nectarine optimum 18–26 °C [PRACT]',
      'callus.upperC': TISSUE_DAMAGE_SOURCE,
      'callus.hoursAtOptimum': `${BENCH_GRAFT_HOURS_SOURCE} No stone-fruit duration found, so the bench-graft figure is used [DESIGN].`,
    },
  }),
  warmCallused({
    key: 'plum',
    name: 'Plum',
    band: { minC: fahrenheitToCelsius(60), maxC: fahrenheitToCelsius(80) },
    callus: { baseC: 0, optLowC: 16, optHighC: fahrenheitToCelsius(80), upperC: TISSUE_DAMAGE_C, hoursAtOptimum: BENCH_GRAFT_HOURS },
    sources: {
      'band.minC': 'REFERENCES §1b growingfruit t/14973: peaches/plums 15.6–26.7 °C (60–80 °F) [PRACT]',
      'band.maxC': 'REFERENCES §1b growingfruit t/14973: peaches/plums 15.6–26.7 °C (60–80 °F) [PRACT]',
      'callus.baseC':
        'REFERENCES §1b Fackler via growingfruit t/9735: plum "similar to apple" [PRACT], so apple\'s 0 °C (§1a H&K [MEM]) [DESIGN]; ' +
        '§2 t/3784: Japanese plum scions budded out within a month at 5 °C [PRACT], so plum tissue is active well below 15 °C.',
      'callus.optLowC': 'REFERENCES §1b gb-online 2013: plum 16 °C (60.8 °F) [PRACT]',
      'callus.optHighC': 'REFERENCES §1b growingfruit t/14973: peaches/plums up to 26.7 °C (80 °F) [PRACT]',
      'callus.upperC': TISSUE_DAMAGE_SOURCE,
      'callus.hoursAtOptimum': `${BENCH_GRAFT_HOURS_SOURCE} No stone-fruit duration found, so the bench-graft figure is used [DESIGN].`,
    },
  }),
  warmCallused({
    key: 'apricot',
    name: 'Apricot',
    ...WARM_20C_SETTINGS,
    sources: {
      ...WARM_20C_SOURCES,
      'band.minC': 'REFERENCES §1b growingfruit t/70053: apricot 18–27 °C [PRACT]',
      'band.maxC': 'REFERENCES §1b growingfruit t/70053: apricot 18–27 °C [PRACT]',
    },
  }),
  warmCallused({
    key: 'cherry',
    name: 'Cherry',
    ...WARM_20C_SETTINGS,
    sources: {
      ...WARM_20C_SOURCES,
      'band.minC': "[DESIGN] apricot's range (REFERENCES §1b t/70053 18–27 °C [PRACT]): gb-online lists cherry with apricot at 20 °C",
      'band.maxC': "[DESIGN] apricot's range (REFERENCES §1b t/70053 18–27 °C [PRACT]): gb-online lists cherry with apricot at 20 °C",
    },
  }),
  warmCallused({
    key: 'walnut',
    name: 'Walnut',
    band: { minC: fahrenheitToCelsius(75), maxC: 29 },
    callus: { baseC: WARM_BASE_C, optLowC: 26, optHighC: 29, upperC: HOT_UPPER_C, hoursAtOptimum: HOT_CALLUS_HOURS },
    sources: {
      'band.minC': 'REFERENCES opening trade facts: walnut calluses at about 75–80 °F (24–27 °C) [PRACT]; lower end, 75 °F exactly',
      'band.maxC': 'REFERENCES §1c Paunović et al. 2010: stratification room 28–29 °C in 2004, mean take 83.4 % [PUB]',
      'callus.baseC': `${NO_WARM_BASE_SOURCE} REFERENCES §1c t/70053: "others use 18 °C, with low callus" [PRACT], so the rate is low but above 0 at 18 °C.`,
      'callus.optLowC': 'REFERENCES §1c Paunović et al. 2010: 26–28 °C (2003) [PUB]; Gandev 2009 27 °C [PUB] and Avanzato & Atefi 1997 27 °C [PUB] lie inside',
      'callus.optHighC': 'REFERENCES §1c Paunović et al. 2010: 28–29 °C (2004), the better of the two seasons [PUB]',
      'callus.upperC': HOT_UPPER_SOURCE,
      'callus.hoursAtOptimum': WALNUT_HOURS_SOURCE,
    },
  }),
  warmCallused({
    key: 'chestnut',
    name: 'Chestnut',
    band: { minC: 21, maxC: 27 },
    callus: { baseC: WARM_BASE_C, optLowC: 23, optHighC: 27, upperC: HOT_UPPER_C, hoursAtOptimum: 9 * 24 },
    sources: {
      'band.minC': 'REFERENCES §1c growingfruit t/70053: chestnut 21–22 °C [PRACT]; washingtonchestnut.com: graft when highs pass ≈21 °C [PRACT]',
      'band.maxC': 'REFERENCES §1c doi 10.2478/agr-2025-0008: 26–27 °C at the graft point, 79.86 % take [PUB]',
      'callus.baseC': NO_WARM_BASE_SOURCE,
      'callus.optLowC': 'REFERENCES §1c growingfruit t/70053: high callus after 8–9 d at 23–24 °C [PRACT]',
      'callus.optHighC': 'REFERENCES §1c doi 10.2478/agr-2025-0008: hot callus at 26–27 °C [PUB]',
      'callus.upperC': HOT_UPPER_SOURCE,
      'callus.hoursAtOptimum': 'REFERENCES §1c growingfruit t/70053: high callus after 8–9 d at 23–24 °C [PRACT]; the longer, 9 d = 216 h [DESIGN]',
    },
  }),
  warmCallused({
    key: 'hazelnut',
    name: 'Hazelnut',
    band: { minC: 22, maxC: 27 },
    callus: { baseC: WARM_BASE_C, optLowC: 22, optHighC: 24, upperC: HOT_UPPER_C, hoursAtOptimum: HOT_CALLUS_HOURS },
    sources: {
      'band.minC': 'REFERENCES §1c Humphrey 2019, Corylus chapter: optimum 22–24 °C ("general consensus") [PUB]',
      'band.maxC': 'REFERENCES §1c NAFEX msg00677: ≈27 °C (80 °F) callusing building [PRACT]',
      'callus.baseC': NO_WARM_BASE_SOURCE,
      'callus.optLowC': 'REFERENCES §1c Humphrey 2019: optimum 22–24 °C [PUB]',
      'callus.optHighC': 'REFERENCES §1c Humphrey 2019: optimum 22–24 °C [PUB]',
      'callus.upperC': HOT_UPPER_SOURCE,
      'callus.hoursAtOptimum': `${WALNUT_HOURS_SOURCE} No hazelnut duration found; walnut's is the nearest published nut-tree figure [DESIGN].`,
    },
  }),
  warmCallused({
    key: 'grape',
    name: 'Grape',
    band: { minC: 21, maxC: 29 },
    callus: { baseC: WARM_BASE_C, optLowC: 24, optHighC: 27, upperC: HOT_UPPER_C, hoursAtOptimum: 14 * 24 },
    sources: {
      'band.minC': 'REFERENCES §1d gb-online 2013: grape 21–24 °C [PRACT]; H&K via t/9735: slow below 20 °C [PUB-2]/[MEM]',
      'band.maxC': 'REFERENCES §1d H&K via t/9735: ≥ 29 °C (85 °F) gives soft, fragile callus [PUB-2]/[MEM]',
      'callus.baseC': 'REFERENCES §1d H&K via t/9735: callusing stops below ≈15.6 °C (60 °F) [PUB-2]/[MEM]',
      'callus.optLowC': 'REFERENCES §1d H&K via t/9735: optimum 24–27 °C (75–80 °F) [PUB-2]/[MEM]',
      'callus.optHighC': 'REFERENCES §1d H&K via t/9735: optimum 24–27 °C (75–80 °F) [PUB-2]/[MEM]',
      'callus.upperC': `${HOT_UPPER_SOURCE} For grape, Alley & Peterson 1977 saw basal callus in 4–17 d at 29.5 °C [PUB], so the rate is still well above 0 there.`,
      'callus.hoursAtOptimum':
        'REFERENCES §1d northerngrapes 2012: callus in 1–3 weeks at 27–29 °C [PRACT]; the middle, 14 d = 336 h [DESIGN]. Alley & Peterson ' +
        '1977 (4–17 d at 29.5 °C [PUB]) timed cuttings, not grafts, so the longer practice figure is used.',
    },
  }),
  warmCallused({
    key: 'persimmon',
    name: 'Persimmon',
    band: { minC: 21, maxC: fahrenheitToCelsius(85) },
    callus: { baseC: 10, optLowC: fahrenheitToCelsius(75), optHighC: fahrenheitToCelsius(85), upperC: HOT_UPPER_C, hoursAtOptimum: HOT_CALLUS_HOURS },
    sources: {
      'band.minC': 'REFERENCES §1d growingfruit t/70053: 21–27 °C [PRACT]; interwovenpermaculture.com: nights ideally ≥ 21 °C [PRACT]',
      'band.maxC': 'REFERENCES §1d growingfruit t/19333: 24–29 °C (75–85 °F) optimal [PRACT]; upper end, 85 °F exactly',
      'callus.baseC': 'REFERENCES §1d growingfruit t/19333: at ≈10 °C "growth almost stopped" [PRACT]',
      'callus.optLowC': 'REFERENCES §1d growingfruit t/19333: 75–85 °F optimal [PRACT]',
      'callus.optHighC': 'REFERENCES §1d growingfruit t/19333: 75–85 °F optimal [PRACT]',
      'callus.upperC': 'REFERENCES §1d growingfruit t/19333: above 32 °C too hot [PRACT]',
      'callus.hoursAtOptimum': `${WALNUT_HOURS_SOURCE} No persimmon duration found; it is hot-callused on the same pipes as walnut (REFERENCES §1c t/42763 [PRACT]) [DESIGN].`,
    },
  }),
  warmCallused({
    key: 'fig',
    name: 'Fig',
    band: { minC: fahrenheitToCelsius(75), maxC: fahrenheitToCelsius(85) },
    callus: { baseC: WARM_BASE_C, optLowC: fahrenheitToCelsius(75), optHighC: fahrenheitToCelsius(85), upperC: HOT_UPPER_C, hoursAtOptimum: 14 * 24 },
    sources: {
      'band.minC': 'REFERENCES §1d growingfruit t/68316: fig 23.9–29.4 °C (75–85 °F) [PRACT]',
      'band.maxC': 'REFERENCES §1d growingfruit t/68316: fig 23.9–29.4 °C (75–85 °F) [PRACT]',
      'callus.baseC': NO_WARM_BASE_SOURCE,
      'callus.optLowC': 'REFERENCES §1d growingfruit t/68316: fig 75–85 °F [PRACT]',
      'callus.optHighC': 'REFERENCES §1d growingfruit t/68316: fig 75–85 °F [PRACT]',
      'callus.upperC': HOT_UPPER_SOURCE,
      'callus.hoursAtOptimum':
        '[DESIGN] No fig duration found; grape\'s 14 d (REFERENCES §1d northerngrapes 2012: 1–3 weeks at 27–29 °C [PRACT]) is used, fig ' +
        'hardwood being callused warm in the same temperature range.',
    },
  }),
  warmCallused({
    key: 'pecan',
    name: 'Pecan',
    band: { minC: 26, maxC: 28 },
    callus: { baseC: WARM_BASE_C, optLowC: 26, optHighC: 28, upperC: HOT_UPPER_C, hoursAtOptimum: HOT_CALLUS_HOURS },
    sources: {
      'band.minC': 'REFERENCES §1c growingfruit t/42763: hot pipe set at 26–28 °C for pecan [PRACT]',
      'band.maxC': 'REFERENCES §1c growingfruit t/42763: hot pipe set at 26–28 °C for pecan [PRACT]',
      'callus.baseC': 'REFERENCES §1c W. Reid: warm nights (lows in the 60s °F) help pecan callus [PRACT]; rate 0 at 60 °F [DESIGN]',
      'callus.optLowC': 'REFERENCES §1c growingfruit t/42763: 26–28 °C [PRACT]',
      'callus.optHighC': 'REFERENCES §1c growingfruit t/42763: 26–28 °C [PRACT]',
      'callus.upperC': 'REFERENCES §1c W. Reid: above 32 °C (90 °F) heat can "cook" a new graft [PRACT]',
      'callus.hoursAtOptimum': `${WALNUT_HOURS_SOURCE} Pecan and walnut are both Juglandaceae; no pecan duration found [DESIGN].`,
    },
  }),
];

function deepFreeze<T>(value: T): T {
  if (value && typeof value === 'object') {
    for (const inner of Object.values(value)) deepFreeze(inner);
    Object.freeze(value);
  }
  return value;
}

/** Validated once at load, so a bad edit to this file fails at start-up rather than in a report. */
export const SPECIES_PROFILES: readonly SpeciesProfile[] = deepFreeze(PROFILES.map((p) => speciesProfileSchema.parse(p)));

/** The built-in profile for a key, or null. Frozen: copy it (structuredClone) before editing. */
export function getSpeciesProfile(key: string): SpeciesProfile | null {
  return SPECIES_PROFILES.find((p) => p.key === key) ?? null;
}
