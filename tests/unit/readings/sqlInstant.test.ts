import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { sqlInstant } from '../../../server/readings/readingStore';

// The reference is the platform's own ISO 8601 formatter (ECMAScript Date.prototype.toISOString, always UTC).
describe('sqlInstant', () => {
  it('formats any instant exactly like toISOString, in SQL form', () => {
    fc.assert(
      fc.property(fc.integer({ min: Date.UTC(1971, 0, 1), max: Date.UTC(2099, 11, 31) }), (t) => {
        expect(sqlInstant(t)).toBe(new Date(t).toISOString().slice(0, 23).replace('T', ' '));
      }),
      { numRuns: 5000 },
    );
  });

  it('handles day boundaries in both directions', () => {
    const midnight = Date.UTC(2026, 2, 29);
    for (const t of [midnight - 1, midnight, midnight + 1, midnight - 1, midnight + 86_399_999]) {
      expect(sqlInstant(t)).toBe(new Date(t).toISOString().slice(0, 23).replace('T', ' '));
    }
  });
});
