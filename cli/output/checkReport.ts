import type { ExposureReport } from '../../shared/exposure';
import type { Detection, ReadSummary } from '../../shared/import/types';
import type { TemperatureBand } from '../../shared/units';
import { celsius, duration, hours, isoUtc, plural } from './format';

/** The exposure `check` prints, with the settings it was computed under. */
export type CheckExposure = ExposureReport & {
  band: TemperatureBand | null;
  /** "--range" or "species apple"; null without a band. */
  bandSource: string | null;
  freezeC: number;
  maxGapMinutes: number;
};

/** Lines of rejections shown in text output; --json lists all that the reader kept. */
const SHOWN_REJECTIONS = 10;

/** The --json object: detection, row counts, line notes, span and exposure, times in ISO 8601 UTC. */
export function checkReportJson(summary: ReadSummary, exposure: CheckExposure) {
  return {
    detected: summary.detected,
    rows: summary.rows,
    rejectedLines: summary.rejectedLines,
    conflictLines: summary.conflictLines,
    span: { first: isoUtc(summary.span.first), last: isoUtc(summary.span.last) },
    exposure: exposure.band ? exposure : withoutBandFigures(exposure),
  };
}

/** Below/above mean nothing without a band, so they are left out rather than shown as zero. */
function withoutBandFigures(exposure: CheckExposure): Omit<CheckExposure, 'below' | 'above'> {
  const { below: _below, above: _above, ...rest } = exposure;
  return rest;
}

export function checkReportLines(file: string, summary: ReadSummary, exposure: CheckExposure): string[] {
  const { detected: d, rows } = summary;
  const lines = [
    `File       ${file}`,
    `Layout     ${layoutText(d)}`,
    `Time       ${timeText(d)}`,
    `Readings   ${temperatureText(d)}`,
    `Rows       ${plural(rows.total, 'row')}: ${rows.accepted} accepted, ${rows.rejected} rejected, ` +
      `${plural(rows.duplicates, 'duplicate')}, ${plural(rows.conflicts, 'conflict')}`,
  ];
  const { first, last } = summary.span;
  if (first !== null && last !== null) lines.push(`Span       ${isoUtc(first)} → ${isoUtc(last)} (${duration(last - first)})`);
  lines.push(...noteLines('Rejected', summary.rejectedLines, rows.rejected));
  lines.push(...noteLines('Conflicts', summary.conflictLines, rows.conflicts));
  lines.push(...exposureLines(exposure));
  return lines;
}

function layoutText(d: Detection): string {
  const delimiter = { ',': 'comma', ';': 'semicolon', '\t': 'tab' }[d.delimiter];
  const encoding = d.encoding === 'windows-1252' ? 'Windows-1252 (Latin-1)' : d.encoding.toUpperCase() + (d.bom ? ' with BOM' : '');
  const parts = [encoding, `${delimiter}-separated`];
  if (d.decimalComma) parts.push('decimal commas');
  if (d.preambleLines > 0) parts.push(`${plural(d.preambleLines, 'preamble line')}`);
  parts.push(d.hasHeader ? `header: ${d.columns.map((name) => `"${name}"`).join(', ')}` : 'no header row');
  if (d.loggerHint) parts.push(`logger ${d.loggerHint}`);
  return parts.join('; ');
}

function timeText(d: Detection): string {
  const t = d.timestamp;
  const columns = t.columns.map((name) => `"${name}"`).join(' + ');
  const parts = [`${columns} as ${t.format}`];
  if (t.dateOrder && t.dateOrderSource !== 'format') {
    const how = { values: 'told by dates past the 12th', series: 'the order that gives a steady series', option: 'from --date-order' }[
      t.dateOrderSource as 'values' | 'series' | 'option'
    ];
    parts.push(`${t.dateOrder} (${how})`);
  }
  const zone = {
    'explicit offset': 'offsets written in the file',
    'epoch (UTC)': 'Unix time (UTC)',
    option: `zone ${t.zone} (from --tz)`,
    default: `zone ${t.zone} (this machine's; use --tz to change)`,
  }[t.zoneSource];
  parts.push(zone);
  if (t.order === 'descending') parts.push('newest first');
  return parts.join('; ');
}

function temperatureText(d: Detection): string {
  const t = d.temperature;
  const unitFrom = { header: 'from the header', values: 'written in the values', preamble: 'from the preamble', option: 'from --unit' }[t.unitSource];
  const column = t.columnSource === 'header' ? `"${t.column}"` : `"${t.column}" (${t.columnSource})`;
  const parts = [`temperature ${column} in °${t.unit} (${unitFrom})`];
  if (t.note) parts.push(t.note);
  parts.push(d.humidityColumn ? `humidity "${d.humidityColumn}"` : 'no humidity column');
  return parts.join('; ');
}

function noteLines(title: string, notes: { line: number; reason: string }[], count: number): string[] {
  if (count === 0) return [];
  const shown = notes.slice(0, SHOWN_REJECTIONS).map((note) => `           line ${note.line}: ${note.reason}`);
  const more = count - shown.length;
  return [`${title.padEnd(10)} ${plural(count, 'line')}`, ...shown, ...(more > 0 ? [`           … and ${more} more (--json lists up to 1,000)`] : [])];
}

function exposureLines(e: CheckExposure): string[] {
  const lines = [
    `Exposure   ${hours(e.hoursCovered)} covered, ${hours(e.hoursMissing)} missing (gaps over ${e.maxGapMinutes} min); ` +
      `min ${celsius(e.minC)}, mean ${celsius(e.meanC)}, max ${celsius(e.maxC)}`,
  ];
  if (e.band) {
    lines.push(
      `           band ${celsius(e.band.minC)} to ${celsius(e.band.maxC)} (${e.bandSource}): ` +
        `below ${hours(e.below.hours)} (${e.below.degreeHours.toFixed(1)} °C·h), above ${hours(e.above.hours)} (${e.above.degreeHours.toFixed(1)} °C·h)`,
    );
  } else {
    lines.push('           no band given (--range or --species): time below/above the band not computed');
  }
  lines.push(`           freeze below ${celsius(e.freezeC)}: ${hours(e.freeze.hours)} (${e.freeze.degreeHours.toFixed(1)} °C·h)`);
  return lines;
}
