import type { ColumnRoles } from './columnRoles';
import { describeFormat, hasMeridiem, hasWrittenOffset } from './timestampFormat';
import { shapeOf } from './writtenTimePatterns';
import type { PrefixFindings } from './inspectPrefix';
import type { DateOrder, DateOrderSource, Detection, TimestampDetection, ZoneSource } from './types';

export interface ZoneChoice {
  zone: string;
  source: ZoneSource;
}

/** The zone the report names: what the file carries, else the option, else the caller's default. */
export function chooseZone(findings: PrefixFindings, optionZone: string | null, defaultZone: string): ZoneChoice {
  const stamp = findings.roles.timestamp;
  if (stamp.kind === 'epoch') return { zone: 'UTC', source: 'epoch (UTC)' };
  const timeTexts = findings.sampleDates.map((written) => written.time ?? written.date);
  if (timeTexts.length > 0 && timeTexts.every(hasWrittenOffset)) return { zone: 'explicit offset', source: 'explicit offset' };
  return optionZone !== null ? { zone: optionZone, source: 'option' } : { zone: defaultZone, source: 'default' };
}

export function buildDetection(
  findings: PrefixFindings,
  dateOrder: { order: DateOrder; source: DateOrderSource } | null,
  zone: ZoneChoice,
  order: 'ascending' | 'descending',
): Detection {
  const { table, roles, unit } = findings;
  return {
    encoding: findings.encoding.encoding,
    bom: findings.encoding.bom,
    delimiter: table.delimiter,
    decimalComma: findings.decimalComma,
    lineEnding: table.lineEnding,
    preambleLines: table.preambleLines,
    hasHeader: table.header !== null,
    columns: roles.columns,
    timestamp: timestampDetection(findings, roles, dateOrder, zone, order),
    temperature: {
      column: roles.columns[roles.temperatureColumn],
      columnSource: roles.temperatureSource,
      unit: unit.unit,
      unitSource: unit.source,
      note: unit.note,
    },
    humidityColumn: roles.humidityColumn === null ? null : roles.columns[roles.humidityColumn],
    loggerHint: findings.loggerHint,
  };
}

function timestampDetection(
  findings: PrefixFindings,
  roles: ColumnRoles,
  dateOrder: { order: DateOrder; source: DateOrderSource } | null,
  zone: ZoneChoice,
  order: 'ascending' | 'descending',
): TimestampDetection {
  const stamp = roles.timestamp;
  const common = {
    dateOrder: dateOrder?.order ?? null,
    dateOrderSource: dateOrder?.source ?? null,
    dateOrderInferred: dateOrder?.source === 'values' || dateOrder?.source === 'series',
    zone: zone.zone,
    zoneSource: zone.source,
    order,
  };
  if (stamp.kind === 'epoch') {
    return {
      kind: stamp.unit === 's' ? 'epoch-s' : 'epoch-ms',
      columns: [roles.columns[stamp.column]],
      format: stamp.unit === 's' ? 'Unix seconds' : 'Unix milliseconds',
      clock: null,
      ...common,
    };
  }
  const sample = findings.sampleDates.find((written) => shapeOf(written.date) !== 'other') ?? findings.sampleDates[0];
  const clock = findings.sampleDates.some((written) => hasMeridiem(written.time ?? written.date)) ? '12h' : '24h';
  if (stamp.kind === 'datetime') {
    return {
      kind: 'datetime',
      columns: [roles.columns[stamp.column]],
      format: describeFormat(sample.date, shapeOf(sample.date), common.dateOrder),
      clock,
      ...common,
    };
  }
  const time = sample.time ?? '';
  return {
    kind: 'date+time',
    columns: [roles.columns[stamp.dateColumn], roles.columns[stamp.timeColumn]],
    format: `${describeFormat(sample.date, shapeOf(sample.date), common.dateOrder)} + ${describeFormat(time, 'time', null)}`,
    clock,
    ...common,
  };
}
