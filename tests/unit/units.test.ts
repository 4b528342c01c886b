import { describe, expect, it } from 'vitest';
import {
  celsiusIntervalToFahrenheit,
  celsiusToFahrenheit,
  fahrenheitIntervalToCelsius,
  fahrenheitToCelsius,
  kelvinToCelsius,
  parseRange,
  parseTemperature,
} from '../../shared/units';

describe('temperature conversion — NIST SP 811 App. B.8/B.9 (REFERENCES §6) [PUB]', () => {
  // REFERENCES §6 check values [CALC] from t/°C = (t/°F − 32)/1.8.
  const checks: [number, number][] = [
    [32, 0],
    [28, -2.2222],
    [45, 7.2222],
    [50, 10],
    [86, 30],
    [90, 32.2222],
    [104, 40],
    [-40, -40],
  ];
  it.each(checks)('%s °F → %s °C', (f, c) => {
    expect(fahrenheitToCelsius(f)).toBeCloseTo(c, 4);
    expect(celsiusToFahrenheit(fahrenheitToCelsius(f))).toBeCloseTo(f, 10);
  });

  it('T/K = (t/°F + 459.67)/1.8 and T/K = t/°C + 273.15 agree', () => {
    for (const f of [-40, 0, 32, 45, 98.6]) {
      expect(kelvinToCelsius((f + 459.67) / 1.8)).toBeCloseTo(fahrenheitToCelsius(f), 10);
    }
  });

  it('an interval of 1 °F is 5/9 °C = 5.555 556 E−01, without offset', () => {
    expect(fahrenheitIntervalToCelsius(1)).toBeCloseTo(0.5555556, 7);
    expect(fahrenheitIntervalToCelsius(9)).toBe(5);
    expect(celsiusIntervalToFahrenheit(5)).toBe(9);
  });
});

describe('parseTemperature', () => {
  it('reads a bare number as °C', () => {
    expect(parseTemperature('-2')).toBe(-2);
    expect(parseTemperature(' 4.5 ')).toBe(4.5);
    expect(parseTemperature('+3')).toBe(3);
  });

  it('reads °F and K suffixes in any case, with or without a degree sign', () => {
    expect(parseTemperature('35F')).toBeCloseTo(1.6666667, 6);
    expect(parseTemperature('35 °F')).toBeCloseTo(1.6666667, 6);
    expect(parseTemperature('28f')).toBeCloseTo(-2.2222, 4);
    expect(parseTemperature('1.5c')).toBe(1.5);
    expect(parseTemperature('-2°C')).toBe(-2);
    expect(parseTemperature('274.15K')).toBeCloseTo(1, 10);
  });

  it.each([
    ['', /Empty temperature/],
    ['warm', /not a number/],
    ['35X', /Unknown temperature unit "X"/],
    ['35 deg', /Unknown temperature unit "deg"/],
    ['1,5', /decimal comma.*"1\.5"/],
    ['1e400', /not a finite number/],
    ['NaN', /not a number/],
    ['-5K', /below absolute zero/],
  ])('rejects %j with a message', (spec, message) => {
    expect(() => parseTemperature(spec)).toThrow(message);
  });
});

describe('parseRange', () => {
  it('converts both ends', () => {
    const band = parseRange('35F:40F');
    expect(band.minC).toBeCloseTo(1.6667, 4);
    expect(band.maxC).toBeCloseTo(4.4444, 4);
    expect(parseRange('0:7')).toEqual({ minC: 0, maxC: 7 });
    expect(parseRange('-3:-2')).toEqual({ minC: -3, maxC: -2 });
  });

  it('lets an end without a unit take the other end\'s, as in "35–40 °F"', () => {
    expect(parseRange('35:40F')).toEqual(parseRange('35F:40F'));
    expect(parseRange('35F:40')).toEqual(parseRange('35F:40F'));
  });

  it('converts mixed units end by end', () => {
    const band = parseRange('0C:40F');
    expect(band.minC).toBe(0);
    expect(band.maxC).toBeCloseTo(4.4444, 4);
  });

  it('accepts equal ends', () => {
    expect(parseRange('2:2')).toEqual({ minC: 2, maxC: 2 });
  });

  it.each([
    ['7:0', /minimum above its maximum/],
    ['40F:35F', /minimum above its maximum/],
    ['5', /two temperatures separated by a colon/],
    ['1:2:3', /two temperatures separated by a colon/],
    [':4', /Empty temperature/],
    ['0:hot', /not a number/],
    ['0:7Q', /Unknown temperature unit "Q"/],
  ])('rejects %j with a message', (spec, message) => {
    expect(() => parseRange(spec)).toThrow(message);
  });
});
