import { describe, expect, it } from 'vitest';
import { codePrefix, nextCode, speciesLetters } from '../../../server/batches/batchCode';

describe('batch codes', () => {
  it('takes the first letter and the following consonants of the species', () => {
    expect(['apple', 'pear', 'plum', 'walnut', 'chestnut', 'fig'].map(speciesLetters)).toEqual(['APL', 'PRE', 'PLM', 'WLN', 'CHS', 'FGI']);
  });

  it('numbers after the highest code of the same year and species, ignoring others', () => {
    expect(codePrefix('2026-11-03', 'apple')).toBe('26-APL-');
    expect(nextCode('26-APL-', ['26-APL-009', '26-APL-014', '25-APL-120', '26-PRE-200', '26-APL-x'])).toBe('26-APL-015');
    expect(nextCode('26-APL-', [])).toBe('26-APL-001');
    expect(nextCode('26-APL-', ['26-APL-999'])).toBe('26-APL-1000');
  });
});
