import type { PackedLine } from './packedLine';

/** One logger's chart lines as the room chart and the overview send them. */
export interface LoggerLines {
  id: number;
  label: string;
  /** When the logger was in the room within the asked range (ISO 8601). */
  windows: { from: string; to: string }[];
  temperature: PackedLine;
  /** Null when the logger recorded no humidity in the range. */
  humidity: PackedLine | null;
}
