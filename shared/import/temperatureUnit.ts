import { readTemperatureCell } from './cellValues';
import { unitInPreambleLine, unitInText } from './columnNames';
import { ImportError } from './importError';
import type { TemperatureUnit, UnitSource } from './types';

export interface UnitDecision {
  unit: TemperatureUnit;
  source: UnitSource;
  note: string | null;
}

export interface UnitEvidence {
  /** The temperature column's header text (units row folded in), or null without a header. */
  headerName: string | null;
  /** Sample cells of the temperature column. */
  cells: string[];
  /** Preamble lines, fields joined. */
  preamble: string[];
  option: TemperatureUnit | undefined;
}

const SYMBOL: Record<TemperatureUnit, string> = { C: '°C', F: '°F' };

/**
 * The unit is taken only from what the file or the user states: the header, units written in the cells,
 * or a preamble line. It is never guessed from the size of the values (2 could be °C or °F in a fridge).
 */
export function decideUnit(evidence: UnitEvidence): UnitDecision {
  const headerUnit = evidence.headerName === null ? null : unitInText(evidence.headerName);
  const cellUnits = new Set<TemperatureUnit>();
  for (const cell of evidence.cells) {
    const value = readTemperatureCell(cell);
    if (value.kind === 'number' && value.unit) cellUnits.add(value.unit);
  }
  if (cellUnits.size > 1) throw mixedUnits('The temperature column holds both °C and °F values.');
  const cellUnit: TemperatureUnit | null = cellUnits.size === 1 ? [...cellUnits][0] : null;
  if (headerUnit !== null && headerUnit !== 'both' && cellUnit !== null && cellUnit !== headerUnit) {
    throw mixedUnits(`The header says ${SYMBOL[headerUnit]} but the values are written in ${SYMBOL[cellUnit]}.`);
  }
  const preambleUnits = new Set(evidence.preamble.map(unitInPreambleLine).filter((unit) => unit !== null));
  const preambleUnit = preambleUnits.size === 1 ? [...preambleUnits][0] : null;

  const stated: { unit: TemperatureUnit; source: UnitSource } | null =
    headerUnit === 'C' || headerUnit === 'F'
      ? { unit: headerUnit, source: 'header' }
      : cellUnit
        ? { unit: cellUnit, source: 'values' }
        : preambleUnit
          ? { unit: preambleUnit, source: 'preamble' }
          : null;

  if (evidence.option) {
    const note =
      stated && stated.unit !== evidence.option
        ? `the file's ${stated.source} says ${SYMBOL[stated.unit]}; the unit option ${evidence.option} was used instead`
        : null;
    return { unit: evidence.option, source: 'option', note };
  }
  if (stated) return { ...stated, note: null };
  const header = evidence.headerName ? ` (header "${evidence.headerName}")` : ' (the file has no header)';
  throw new ImportError(
    'unit_unknown',
    `The file does not say whether temperatures are in °C or °F${header}. Run again with --unit C or --unit F.`,
  );
}

export function mixedUnits(detail: string): ImportError {
  return new ImportError('mixed_units', `${detail} One column must hold one unit: fix or split the file, then import it again.`);
}
