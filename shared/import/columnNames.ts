import type { TemperatureUnit } from './types';

/** Lower-cases a header and folds the ways a degree sign gets written (or mangled by a wrong encoding). */
function fold(text: string): string {
  return text
    .toLowerCase()
    .replace(/â°|Â°/gi, '°')
    .replace(/º/g, '°')
    .replace(/℃/g, '°c')
    .replace(/℉/g, '°f');
}

/** A unit token on its own: "°F", "degF", "Fahrenheit", "(F)", "[F]", "_f", or a bare "F" word. */
function unitPattern(letter: 'c' | 'f', word: string): RegExp {
  return new RegExp(
    `°\\s*${letter}(?![a-z])|\\bdeg(?:ree)?s?\\.?\\s*${letter}(?![a-z])|${word}|(?:^|[\\s_\\-(\\[/])${letter}(?=$|[\\s)\\]/])`,
  );
}

const FAHRENHEIT = unitPattern('f', 'fahrenheit');
const CELSIUS = unitPattern('c', 'celsius');

/** The temperature unit a header or label names, 'both' when it names both, null when neither. */
export function unitInText(text: string): TemperatureUnit | 'both' | null {
  const folded = fold(text);
  const f = FAHRENHEIT.test(folded);
  const c = CELSIUS.test(folded);
  if (f && c) return 'both';
  return f ? 'F' : c ? 'C' : null;
}

const TEMPERATURE_WORD = /temp|température|temperatur|\btmp\b|^t\s*(?:$|[(\[_])|celsius|fahrenheit|°\s*[cf]|\bdeg\s*[cf]\b|\bdeg[cf]\b/;
const NOT_ROOM_TEMPERATURE = /dew|set\s*-?point|alarm|limit|threshold|battery|volt|signal|rssi|heat\s*index|wet\s*bulb/;
const HUMIDITY_WORD = /\brh\b|%\s*rh|humid|feuchte|\bhr\b|\bhum\b|moisture/;
const INDEX_WORD = /^(?:#|no\.?|nr\.?|n°|num(?:ber)?|index|idx|id|record|rec|row|seq(?:uence)?)(?:\s*#|\s*no\.?)?$/;
const TIME_WORD = /time|date|datum|zeit|stamp|epoch|unix|when|heure|fecha/;

export function namesTemperature(name: string): boolean {
  const folded = fold(name);
  if (NOT_ROOM_TEMPERATURE.test(folded) || HUMIDITY_WORD.test(folded)) return false;
  return TEMPERATURE_WORD.test(folded) || unitInText(name) !== null;
}

export function namesHumidity(name: string): boolean {
  const folded = fold(name);
  return HUMIDITY_WORD.test(folded) && !/dew/.test(folded);
}

export function namesIndex(name: string): boolean {
  return INDEX_WORD.test(fold(name).trim());
}

export function namesTime(name: string): boolean {
  return TIME_WORD.test(fold(name));
}

const LOGGER_LINE =
  /^[\s#;/*]*(?:logger|data\s*logger|serial(?:\s*(?:no\.?|number|#))?|s\/n|device|probe|label|sensor)(?:\s*(?:id|name|label|no\.?|#))?\s*[:=#]\s*["']?([^"';,\t]+?)["']?\s*$/i;

/** A logger serial or label named on a preamble line, e.g. "Logger: K-01" or "Serial no. = 40177". */
export function loggerHintInLine(text: string): string | null {
  const match = LOGGER_LINE.exec(text);
  return match ? match[1].trim() : null;
}

/** A unit stated on a preamble line that talks about units or temperature ("Unit: °F", "Temperature scale: Celsius"). */
export function unitInPreambleLine(text: string): TemperatureUnit | null {
  if (!/unit|scale|temp|einheit|unité/i.test(text)) return null;
  const unit = unitInText(text);
  return unit === 'both' ? null : unit;
}
