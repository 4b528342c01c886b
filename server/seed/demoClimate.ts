// Invented room climates for the demo nursery: smooth daily and weather cycles, a little noise, and the events a
// season brings (a cold front in the garage, a fridge defrost, a missed day). Deterministic, so every start agrees.

const HOUR = 3600_000;
const DAY = 24 * HOUR;

/** A small seeded generator (mulberry32): demo data must look random yet come out the same on every machine. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export type ClimateName = 'cellar' | 'garage-door' | 'garage-wall' | 'callus' | 'fridge';

/** Outdoor weather felt through walls: fronts every few days, coldest before dawn (about 06:00 local, 12:00 UTC in Chicago). */
function weather(t: number): number {
  const days = t / DAY;
  const front = 3.2 * Math.sin((2 * Math.PI * days) / 5.3) + 1.8 * Math.sin((2 * Math.PI * days) / 11.7 + 1.1);
  const daily = -Math.cos((2 * Math.PI * (t - 12 * HOUR)) / DAY);
  return front + 2.6 * daily;
}

export function temperatureAt(climate: ClimateName, t: number, noise: number): number {
  switch (climate) {
    case 'cellar':
      return 3.6 + 0.18 * weather(t) + 0.15 * noise;
    case 'garage-wall':
      return 1.9 + 0.75 * weather(t) + 0.2 * noise;
    case 'garage-door':
      return 0.9 + 0.95 * weather(t) + 0.3 * noise;
    case 'callus': {
      // A thermostat cycling about every 50 minutes around 26 °C.
      const cycle = ((t / (50 * 60_000)) % 1) * 2 - 1;
      return 26 + 0.6 * Math.abs(cycle) - 0.3 + 0.1 * noise;
    }
    case 'fridge': {
      // A defrost every 8 hours lifts the top shelf for about 20 minutes.
      const sinceDefrost = t % (8 * HOUR);
      return 1.4 + 0.2 * noise + (sinceDefrost < 20 * 60_000 ? 2.4 : 0);
    }
  }
}

export function humidityAt(climate: ClimateName, noise: number): number | null {
  return climate === 'cellar' ? Math.min(99, 91 + 2 * noise) : null;
}
