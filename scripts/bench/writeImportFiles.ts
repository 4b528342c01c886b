// Writes bench:import's files in a process of its own, so generating 80 MB of text leaves no garbage in the server
// whose memory the benchmark measures: tsx scripts/bench/writeImportFiles.ts <dir> <rows> <extra rows>
import { createWriteStream } from 'node:fs';
import { once } from 'node:events';
import { join } from 'node:path';
import { packReadings } from '../../server/imports/packedReadings';
import { loadDataRows } from '../../server/readings/loadDataText';

const [dir, rowsText, extraText] = process.argv.slice(2);
const rows = Number(rowsText);
const STEP_MS = 30_000;
const START = Date.UTC(2025, 10, 1);
const temperature = (i: number) => (3 + 2 * Math.sin((i / 2880) * 2 * Math.PI) + ((i * 7919) % 13) / 100).toFixed(2);

async function write(path: string, header: string | null, count: number, line: (i: number) => string): Promise<void> {
  const out = createWriteStream(path);
  if (header !== null) out.write(`${header}\n`);
  for (let i = 0; i < count; i++) {
    if (!out.write(line(i))) await once(out, 'drain');
  }
  out.end();
  await once(out, 'finish');
}

const exported = (i: number) => `${new Date(START + i * STEP_MS).toISOString()},${temperature(i)}\n`;
await write(join(dir, 'season.csv'), 'time,temperature °C', rows, exported);
// The next night's export: everything again plus one more day.
await write(join(dir, 'nightly.csv'), 'time,temperature °C', rows + Number(extraText), exported);
// The same rows as the importer hands them to LOAD DATA, byte for byte.
const tsv = createWriteStream(join(dir, 'rows.tsv'));
for (let from = 0; from < rows; from += 10_000) {
  const batch = Array.from({ length: Math.min(10_000, rows - from) }, (_, k) => ({ t: START + (from + k) * STEP_MS, c: Number(temperature(from + k)), rh: null, line: 0 }));
  if (!tsv.write(loadDataRows(packReadings(batch)))) await once(tsv, 'drain');
}
tsv.end();
await once(tsv, 'finish');
