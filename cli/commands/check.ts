import { Command, InvalidArgumentError, Option } from 'commander';
import { createReadStream } from 'node:fs';
import { computeExposure, DEFAULT_MAX_GAP_MINUTES, toExposureReport, type Reading as ExposureReading } from '../../shared/exposure';
import { readLoggerFile } from '../../shared/import/readLoggerFile';
import type { DateOrder, ReadSummary, TemperatureUnit } from '../../shared/import/types';
import { getSpeciesProfile, SPECIES_PROFILES } from '../../shared/species/profiles';
import { parseRange, parseTemperature, type TemperatureBand } from '../../shared/units';
import { checkReportJson, checkReportLines, type CheckExposure } from '../output/checkReport';
import { usageError } from '../output/cliError';
import { EXIT, type ExitCode } from '../output/exitCodes';
import { printJson, printLines } from '../output/streams';

/** Freeze limit when neither --freeze nor --species gives one (the brief's default; common practice). */
const DEFAULT_FREEZE_C = -2;
const READ_CHUNK_BYTES = 256 * 1024;

interface CheckFlags {
  tz?: string;
  unit?: TemperatureUnit;
  dateOrder?: DateOrder;
  range?: TemperatureBand;
  species?: string;
  freeze?: number;
  maxGap: number;
  json?: boolean;
}

export function checkCommand(): Command {
  return new Command('check')
    .description('Read a logger file without a server: show what was detected, the rows kept and rejected, and the exposure.')
    .argument('<file>', 'logger export (CSV or tab-separated text)')
    .option('--tz <zone>', 'time zone of timestamps written without an offset: IANA name (Europe/Berlin) or offset (+01:00); default: this machine\'s zone')
    .addOption(new Option('--unit <unit>', 'temperature unit when the file does not say: C or F').argParser(parseUnit))
    .addOption(new Option('--date-order <order>', 'day/month order of dates such as 03/04/2024').choices(['dmy', 'mdy', 'ymd']))
    .addOption(new Option('--range <min:max>', 'storage band, °C or with F suffix, e.g. 1:4.5 or 35F:40F').argParser(parseBand).conflicts('species'))
    .option('--species <name>', `species profile giving band and freeze limit (${SPECIES_PROFILES.map((p) => p.key).join(', ')})`)
    .addOption(new Option('--freeze <t>', 'freeze limit, °C or with F suffix (default: the species\', else -2 °C)').argParser(parseTemperatureFlag))
    .addOption(new Option('--max-gap <minutes>', 'readings further apart than this are not joined').argParser(parseMinutes).default(DEFAULT_MAX_GAP_MINUTES))
    .option('--json', 'print one JSON object instead of text')
    .action(async (file: string, flags: CheckFlags) => {
      process.exitCode = await runCheck(file, flags);
    });
}

async function runCheck(file: string, flags: CheckFlags): Promise<ExitCode> {
  const settings = exposureSettings(flags);
  const times: number[] = [];
  const temps: number[] = [];
  const summary = await readLoggerFile(
    () => createReadStream(file, { highWaterMark: READ_CHUNK_BYTES }),
    {
      tz: flags.tz,
      unit: flags.unit,
      dateOrder: flags.dateOrder,
      defaultZone: Intl.DateTimeFormat().resolvedOptions().timeZone,
    },
    async (batch) => {
      for (const reading of batch) {
        times.push(reading.t);
        temps.push(reading.c);
      }
    },
  );
  const exposure: CheckExposure = {
    ...settings,
    ...toExposureReport(computeExposure(inTimeOrder(times, temps), { ...settings, band: settings.band ?? OPEN_BAND })),
  };
  if (flags.json) printJson(checkReportJson(summary, exposure));
  else printLines(checkReportLines(file, summary, exposure));
  return hasProblems(summary) ? EXIT.rowsRejected : EXIT.ok;
}

/** Without --range or --species there is no band; a band wider than any accepted reading leaves below/above empty. */
const OPEN_BAND: TemperatureBand = { minC: -1000, maxC: 1000 };

function exposureSettings(flags: CheckFlags): Pick<CheckExposure, 'band' | 'bandSource' | 'freezeC' | 'maxGapMinutes'> {
  let band = flags.range ?? null;
  let bandSource = band ? '--range' : null;
  let freezeC = DEFAULT_FREEZE_C;
  if (flags.species !== undefined) {
    const profile = getSpeciesProfile(flags.species.trim().toLowerCase());
    if (!profile) {
      throw usageError(`unknown species "${flags.species}". Known: ${SPECIES_PROFILES.map((p) => p.key).join(', ')}.`);
    }
    band = { ...profile.band };
    bandSource = `species ${profile.key}`;
    freezeC = profile.freezeC;
  }
  return { band, bandSource, freezeC: flags.freeze ?? freezeC, maxGapMinutes: flags.maxGap };
}

/** The exposure engine wants readings in time order; newest-first files are turned round. */
function* inTimeOrder(times: number[], temps: number[]): Generator<ExposureReading> {
  let sorted = true;
  for (let i = 1; i < times.length && sorted; i++) sorted = times[i - 1] <= times[i];
  const order = Array.from(times.keys());
  if (!sorted) order.sort((a, b) => times[a] - times[b]);
  for (const i of order) yield { t: times[i], c: temps[i] };
}

function hasProblems(summary: ReadSummary): boolean {
  return summary.rows.rejected > 0 || summary.rows.conflicts > 0;
}

function parseUnit(value: string): TemperatureUnit {
  const unit = value.trim().replace(/^°/, '').toUpperCase();
  if (unit !== 'C' && unit !== 'F') throw new InvalidArgumentError('give C or F.');
  return unit;
}

function parseBand(value: string): TemperatureBand {
  try {
    return parseRange(value);
  } catch (error) {
    throw new InvalidArgumentError((error as Error).message);
  }
}

function parseTemperatureFlag(value: string): number {
  try {
    return parseTemperature(value);
  } catch (error) {
    throw new InvalidArgumentError((error as Error).message);
  }
}

function parseMinutes(value: string): number {
  const minutes = Number(value);
  if (value.trim() === '' || !Number.isFinite(minutes) || minutes <= 0) throw new InvalidArgumentError('give a number of minutes above 0.');
  return minutes;
}
