// Display conversion: °F = °C × 1.8 + 32 exactly (NIST SP 811, App. B.9), shown to a tenth with a true minus sign.
import { describe, expect, it } from 'vitest';
import { formatTemperature, toDisplay } from '../../../src/charts/displayUnits';

describe('temperatures for display', () => {
  it('convert with the NIST SP 811 relation: −2 °C is 28.4 °F, 0 °C is 32 °F, 7.2222 °C is 45 °F', () => {
    expect(toDisplay(-2, 'F')).toBeCloseTo(28.4, 12);
    expect(toDisplay(0, 'F')).toBe(32);
    expect(toDisplay(7.2222, 'F')).toBeCloseTo(44.99996, 9);
    expect(toDisplay(3.5, 'C')).toBe(3.5);
  });

  it('read "−2.2 °C" and "28.0 °F", the minus sign a real one', () => {
    expect(formatTemperature(-2.2, 'C')).toBe('−2.2 °C');
    expect(formatTemperature(-2.2222, 'F')).toBe('28.0 °F');
    expect(formatTemperature(0.04, 'C')).toBe('0.0 °C');
  });
});
