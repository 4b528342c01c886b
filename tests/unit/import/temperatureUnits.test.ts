import { describe, expect, it } from 'vitest';
import { unitInText } from '../../../shared/import/columnNames';
import { importErrorOf, readText } from './readText';

describe('unit from the header text', () => {
  it.each([
    ['Temperature (°C)', 'C'],
    ['Temp °F', 'F'],
    ['T(°C)', 'C'],
    ['Temp (F)', 'F'],
    ['Temp [C]', 'C'],
    ['temperature_c', 'C'],
    ['temperature_f', 'F'],
    ['degC', 'C'],
    ['Temp degF', 'F'],
    ['Celsius', 'C'],
    ['Fahrenheit', 'F'],
    ['Temp ℃', 'C'],
    ['Temp ºF', 'F'],
    ['Temp Â°C', 'C'],
    ['Temp C', 'C'],
    ['Temperature', null],
    ['Temp', null],
    ['Fridge temp', null],
    ['Temp (°C/°F)', 'both'],
  ])('%s → %s', (header, unit) => {
    expect(unitInText(header)).toBe(unit);
  });
});

describe('temperature unit decisions', () => {
  it('converts °F exactly: (°F − 32) / 1.8 (NIST SP 811 App. B.8; REFERENCES §6 check values)', async () => {
    const { readings } = await readText('Time,Temp (F)\n2025-01-20 00:00,32\n2025-01-20 00:10,28\n2025-01-20 00:20,45\n2025-01-20 00:30,50\n2025-01-20 00:40,-40\n');
    expect(readings[0].c).toBe(0);
    expect(readings[1].c).toBeCloseTo(-2.2222, 4);
    expect(readings[2].c).toBeCloseTo(7.2222, 4);
    expect(readings[3].c).toBe(10);
    expect(readings[4].c).toBe(-40);
  });

  it('stops and asks for --unit when nothing states the unit, even for values that look like °C', async () => {
    const error = await importErrorOf(readText('Time,Temperature\n2025-01-20 00:00,3.5\n'));
    expect(error.code).toBe('unit_unknown');
    expect(error.message).toContain('--unit C or --unit F');
  });

  it('takes the unit from a preamble line that names it', async () => {
    const { summary } = await readText('Unit: °F\nTime,Temperature\n2025-01-20 00:00,38.5\n');
    expect(summary.detected.temperature).toMatchObject({ unit: 'F', unitSource: 'preamble' });
  });

  it('takes the unit written in the values', async () => {
    const { summary, readings } = await readText('Time,Reading\n2025-01-20 00:00,35.6 °F\n2025-01-20 00:10,35.6°F\n');
    expect(summary.detected.temperature).toMatchObject({ unit: 'F', unitSource: 'values' });
    expect(readings[0].c).toBeCloseTo(2, 12);
  });

  it('reads a bare degree sign after a value as the column unit', async () => {
    const { readings } = await readText('Time,Temp (°F)\n2025-01-20 00:00,50°\n');
    expect(readings[0].c).toBe(10);
  });

  it('lets --unit overrule the header, and says so', async () => {
    const { summary, readings } = await readText('Time,Temp °F\n2025-01-20 00:00,3.5\n', { unit: 'C' });
    expect(summary.detected.temperature).toMatchObject({ unit: 'C', unitSource: 'option' });
    expect(summary.detected.temperature.note).toContain('header says °F');
    expect(readings[0].c).toBe(3.5);
  });

  it('refuses a column that mixes °C and °F, also when the mix comes after the first rows', async () => {
    const early = await importErrorOf(readText('Time,Reading\n2025-01-20 00:00,3.5 °C\n2025-01-20 00:10,38.3 °F\n'));
    expect(early.code).toBe('mixed_units');
    const late = ['Time,Temp °C', ...Array.from({ length: 3000 }, (_, i) => `2025-01-20 00:${String(i % 60).padStart(2, '0')}:${String(i % 60).padStart(2, '0')},3.5`)];
    late.push('2025-01-21 00:00,38.3 °F');
    const error = await importErrorOf(readText(late.join('\n')));
    expect(error.code).toBe('mixed_units');
    expect(error.message).toContain(`Line ${late.length}`);
  });
});
