// Attention rules for the overview; limits from REFERENCES §3 last row [DESIGN] (warn ≤ 0 °C, alarm below −2 °C for
// unfrozen grafts) when no species is stored, else the stored species' own freeze limit and band.
import { describe, expect, it } from 'vitest';
import { attentionLevel, roomConcerns, type RoomState } from '../../../shared/overview/roomAttention';

const HOUR = 3_600_000;
const NOW = Date.UTC(2026, 11, 2, 6);
const logger = (c: number, ageHours = 0.5) => ({ label: 'K-1', latest: { t: NOW - ageHours * HOUR, c }, intervalMs: 10 * 60_000 });
const room = (over: Partial<RoomState>): RoomState => ({ loggersNow: [logger(3)], lowest24hC: 2, species: [], batchCount: 0, ...over });
const judge = (state: RoomState) => {
  const concerns = roomConcerns(state, NOW);
  return { level: attentionLevel(state, concerns), concerns: concerns.map((c) => c.level) };
};
const APPLE = { name: 'Apple', freezeC: -2, band: { minC: 0, maxC: 7.2 } };
const WALNUT = { name: 'Walnut', freezeC: -2, band: { minC: 24, maxC: 29 } };

describe('room attention', () => {
  it('a room reading 3 °C with no batches is fine; an unused room is idle', () => {
    expect(judge(room({}))).toEqual({ level: 'ok', concerns: [] });
    expect(judge(room({ loggersNow: [], lowest24hC: null }))).toEqual({ level: 'idle', concerns: [] });
  });

  it('no species: warn at 0 °C, alarm below −2 °C', () => {
    expect(judge(room({ loggersNow: [logger(0)] }))).toEqual({ level: 'warn', concerns: ['warn'] });
    expect(judge(room({ loggersNow: [logger(-2)] }))).toEqual({ level: 'warn', concerns: ['warn'] });
    expect(judge(room({ loggersNow: [logger(-2.1)] }))).toEqual({ level: 'alarm', concerns: ['alarm'] });
  });

  it("stored species: each band's ends, and the freeze limit instead of 0 °C", () => {
    expect(judge(room({ species: [APPLE], batchCount: 1, loggersNow: [logger(0)] }))).toEqual({ level: 'ok', concerns: [] });
    expect(judge(room({ species: [APPLE], batchCount: 1, loggersNow: [logger(-0.5)] }))).toEqual({ level: 'warn', concerns: ['warn'] });
    expect(judge(room({ species: [APPLE, WALNUT], batchCount: 2, loggersNow: [logger(5)] })).concerns).toEqual(['warn']);
    expect(judge(room({ species: [APPLE], batchCount: 1, loggersNow: [logger(8)] })).concerns).toEqual(['warn']);
  });

  it('a stale logger is a warning and its old value is not judged', () => {
    expect(judge(room({ loggersNow: [logger(-9, 27)] }))).toEqual({ level: 'warn', concerns: ['warn'] });
    expect(judge(room({ loggersNow: [{ label: 'K-9', latest: null, intervalMs: null }] }))).toEqual({ level: 'warn', concerns: ['warn'] });
  });

  it('a freeze in the last 24 h warns when the room is no longer freezing now', () => {
    expect(judge(room({ lowest24hC: -4 }))).toEqual({ level: 'warn', concerns: ['warn'] });
    expect(judge(room({ lowest24hC: -4, loggersNow: [logger(-3)] }))).toEqual({ level: 'alarm', concerns: ['alarm'] });
  });

  it('grafts with no logger to watch them need attention', () => {
    expect(judge(room({ loggersNow: [], batchCount: 3, lowest24hC: null }))).toEqual({ level: 'warn', concerns: ['warn'] });
  });
});
