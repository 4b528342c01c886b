// Cutting a batch placement where the set of loggers in its room changes (hand-worked cases).
import { describe, expect, it } from 'vitest';
import { splitByLoggers } from '../../../server/exposure/spans';

const H = 3_600_000;
const stay = (loggerId: number, from: number, to: number | null) => ({ loggerId, roomId: 1, from: from * H, to: to === null ? null : to * H });
const cut = (pieces: ReturnType<typeof splitByLoggers>) => pieces.map((p) => [p.from / H, p.to / H, p.loggerIds]);

describe('splitByLoggers', () => {
  it('keeps a placement whole when one logger watched all of it', () => {
    expect(cut(splitByLoggers({ from: 2 * H, to: 10 * H }, [stay(7, 0, null)]))).toEqual([[2, 10, [7]]]);
  });

  it('cuts where a second logger arrives and where the first one leaves', () => {
    expect(cut(splitByLoggers({ from: 0, to: 10 * H }, [stay(1, 0, 6), stay(2, 4, null)]))).toEqual([
      [0, 4, [1]],
      [4, 6, [1, 2]],
      [6, 10, [2]],
    ]);
  });

  it('leaves unwatched stretches as pieces without loggers, including a logger gone and back', () => {
    expect(cut(splitByLoggers({ from: 0, to: 10 * H }, [stay(3, 1, 3), stay(3, 5, 8)]))).toEqual([
      [0, 1, []],
      [1, 3, [3]],
      [3, 5, []],
      [5, 8, [3]],
      [8, 10, []],
    ]);
  });

  it('ignores stays that only touch the placement', () => {
    expect(cut(splitByLoggers({ from: 5 * H, to: 9 * H }, [stay(1, 0, 5), stay(2, 9, null)]))).toEqual([[5, 9, []]]);
  });
});
