// The shapes GET /api/rooms/:id/series and the overview send for charts.
import type { LoggerLines } from '../../shared/series/loggerLines';

export interface SpeciesMarks {
  key: string;
  name: string;
  freezeC: number;
  band: { minC: number; maxC: number };
  spans: { from: string; to: string }[];
}

export interface BatchMove {
  t: string;
  batchId: number;
  code: string;
  direction: 'in' | 'out';
}

export interface RoomSeries {
  roomId: number;
  from: string;
  to: string;
  width: number;
  bucketMs: number;
  blockMinutes: number | null;
  maxGapMinutes: number;
  loggers: LoggerLines[];
  species: SpeciesMarks[];
  moves: BatchMove[];
}
