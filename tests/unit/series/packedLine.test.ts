import { describe, expect, it } from 'vitest';
import { packLine, unpackLine } from '../../../shared/series/packedLine';

describe('packed lines', () => {
  const line = [
    { t: 1_796_083_200_000, v: -1.25 },
    { t: 1_796_083_260_000, v: null },
    { t: 1_796_083_500_123, v: 3 },
  ];

  it('store the first instant whole and each later one as the step from the previous', () => {
    expect(packLine(line)).toEqual({ dt: [1_796_083_200_000, 60_000, 240_123], v: [-1.25, null, 3] });
  });

  it('unpack to the same points, and an empty line stays empty', () => {
    expect(unpackLine(packLine(line))).toEqual(line);
    expect(unpackLine(packLine([]))).toEqual([]);
  });

  it('refuse columns of different lengths', () => {
    expect(() => unpackLine({ dt: [1, 2], v: [1] })).toThrow(/2 times and 1 values/);
  });
});
