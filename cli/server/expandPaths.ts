import { stat } from 'node:fs/promises';
import { glob, isDynamicPattern } from 'tinyglobby';
import { failure } from '../output/cliError';

const LOGGER_FILE = '*.{csv,CSV,txt,TXT,tsv,TSV}';

/**
 * Files as given, folders as the logger files directly inside them, and patterns (quoted in cron lines, so the shell
 * did not expand them) as what they match. Sorted, without repeats.
 */
export async function expandPaths(paths: string[]): Promise<string[]> {
  const found = new Set<string>();
  for (const path of paths) {
    if (isDynamicPattern(path)) {
      const matches = await glob(path, { onlyFiles: true, absolute: false, expandDirectories: false });
      if (matches.length === 0) throw failure(`No file matches ${path}.`);
      matches.forEach((m) => found.add(m));
      continue;
    }
    const info = await stat(path).catch(() => null);
    if (!info) throw failure(`${path}: no such file or folder.`);
    if (info.isDirectory()) {
      const inside = await glob(LOGGER_FILE, { cwd: path, onlyFiles: true, absolute: true, expandDirectories: false });
      if (inside.length === 0) throw failure(`${path}: no .csv, .txt or .tsv files in this folder.`);
      inside.forEach((m) => found.add(m));
    } else {
      found.add(path);
    }
  }
  return [...found].sort();
}
