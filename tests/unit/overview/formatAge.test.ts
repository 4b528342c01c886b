import { describe, expect, it } from 'vitest';
import { formatAge } from '../../../src/overview/formatAge';

const MINUTE = 60_000;

describe('reading age', () => {
  it('reads as just now, minutes, hours, then days', () => {
    expect(formatAge(59_999)).toBe('just now');
    expect(formatAge(14 * MINUTE + 59_000)).toBe('14 min ago');
    expect(formatAge(60 * MINUTE)).toBe('1 h ago');
    expect(formatAge(47 * 60 * MINUTE)).toBe('47 h ago');
    expect(formatAge(49 * 60 * MINUTE)).toBe('2 d ago');
  });
});
