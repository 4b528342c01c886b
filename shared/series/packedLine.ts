// The wire form of a chart line. Columns instead of objects, and each instant as the milliseconds since the previous
// point: a 4,800-point line of epoch milliseconds as [{t,v}] objects is about 150 KB of JSON, this about 75 KB.
import type { LinePoint } from './m4';

export interface PackedLine {
  /** The first entry is epoch ms; every later one is the ms since the point before it. */
  dt: number[];
  /** °C (or % RH); null breaks the line. */
  v: (number | null)[];
}

export function packLine(points: readonly LinePoint[]): PackedLine {
  const dt: number[] = [];
  const v: (number | null)[] = [];
  let previous = 0;
  for (const p of points) {
    dt.push(p.t - previous);
    v.push(p.v);
    previous = p.t;
  }
  return { dt, v };
}

export function unpackLine(line: PackedLine): LinePoint[] {
  if (line.dt.length !== line.v.length) throw new Error(`packed line has ${line.dt.length} times and ${line.v.length} values`);
  let t = 0;
  return line.dt.map((step, i) => {
    t += step;
    return { t, v: line.v[i] };
  });
}
