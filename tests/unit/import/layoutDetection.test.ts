import { describe, expect, it } from 'vitest';
import { bytesOf, readBytes, readText, utc } from './readText';

describe('encoding', () => {
  it('reads UTF-8 with a byte-order mark and drops the mark (Unicode Standard §23.8, from memory)', async () => {
    const text = '\uFEFFTime,Temp (°C)\n2025-01-13 08:00,3.5\n';
    const { summary, readings } = await readText(text);
    expect(summary.detected.encoding).toBe('utf-8');
    expect(summary.detected.bom).toBe(true);
    expect(summary.detected.columns[0]).toBe('Time');
    expect(readings).toEqual([{ t: utc('2025-01-13T08:00:00Z'), c: 3.5, rh: null, line: 2 }]);
  });

  it('reads a UTF-8 degree sign split across chunks', async () => {
    const { summary } = await readText('Time,Temperatur °C\n2025-01-13 08:00,3.5\n', {}, 3);
    expect(summary.detected.temperature.column).toBe('Temperatur °C');
    expect(summary.detected.temperature.unit).toBe('C');
  });

  it('tells Windows-1252 / Latin-1 from the lone 0xB0 degree byte (ISO 8859-1 code chart)', async () => {
    const bytes = bytesOf('Zeit;Temp °C\n13.01.2025 08:00;3,5\n14.01.2025 08:00;3,7\n', 'latin1');
    expect(bytes[10]).toBe(0xb0);
    const { summary, readings } = await readBytes(bytes);
    expect(summary.detected.encoding).toBe('windows-1252');
    expect(summary.detected.temperature.column).toBe('Temp °C');
    expect(readings.map((r) => r.c)).toEqual([3.5, 3.7]);
  });

  it('reads UTF-16LE with its byte-order mark', async () => {
    const bytes = Uint8Array.from(Buffer.from('\uFEFFTime\tTemp °F\r\n2025-01-13 08:00\t38.3\r\n', 'utf16le'));
    const { summary, readings } = await readBytes(bytes);
    expect(summary.detected.encoding).toBe('utf-16le');
    expect(summary.detected.delimiter).toBe('\t');
    expect(readings[0].c).toBeCloseTo((38.3 - 32) / 1.8, 12);
  });
});

describe('delimiter, decimal comma and line ends', () => {
  it('comma with decimal points', async () => {
    const { summary } = await readText('Time,Temp C,RH\n2025-01-13 08:00,3.5,90\n');
    expect(summary.detected.delimiter).toBe(',');
    expect(summary.detected.decimalComma).toBe(false);
  });

  it('semicolon with decimal commas (the commas also split every row evenly; semicolon must win)', async () => {
    const { summary, readings } = await readText('Zeit;Temp °C;RH %\n2025-01-13 08:00;3,5;90,5\n2025-01-13 08:30;-0,5;91,0\n');
    expect(summary.detected.delimiter).toBe(';');
    expect(summary.detected.decimalComma).toBe(true);
    expect(readings.map((r) => [r.c, r.rh])).toEqual([
      [3.5, 90.5],
      [-0.5, 91],
    ]);
  });

  it('tab', async () => {
    const { summary } = await readText('Time\tTemp C\n2025-01-13 08:00\t3.5\n');
    expect(summary.detected.delimiter).toBe('\t');
  });

  it('quoted fields with a decimal comma inside a comma-separated file (RFC 4180 §2.6)', async () => {
    const { summary, readings } = await readText('"Time","Temp (°C)"\n"2025-01-13 08:00","3,5"\n');
    expect(summary.detected.delimiter).toBe(',');
    expect(summary.detected.decimalComma).toBe(true);
    expect(readings[0].c).toBe(3.5);
  });

  it('CRLF, CR-only, and LF mixed with CRLF line ends', async () => {
    const crlf = await readText('Time,Temp C\r\n2025-01-13 08:00,3.5\r\n2025-01-13 08:30,3.6\r\n');
    expect(crlf.summary.detected.lineEnding).toBe('CRLF');
    expect(crlf.readings.map((r) => r.line)).toEqual([2, 3]);
    const mixed = await readText('Time,Temp C\r\n2025-01-13 08:00,3.5\n2025-01-13 08:30,3.6\r\n2025-01-13 09:00,3.7\n');
    expect(mixed.readings.map((r) => [r.line, r.c])).toEqual([
      [2, 3.5],
      [3, 3.6],
      [4, 3.7],
    ]);
    const cr = await readText('Time,Temp C\r2025-01-13 08:00,3.5\r2025-01-13 08:30,3.6\r');
    expect(cr.summary.detected.lineEnding).toBe('CR');
    expect(cr.readings.map((r) => r.line)).toEqual([2, 3]);
  });
});

describe('preamble, header and logger label', () => {
  it('counts preamble lines, finds the header under them and the logger label in them', async () => {
    const text = [
      '# Coldknit test rig',
      'Logger: K-01',
      'Room: Root cellar',
      '',
      'Time,Temperature (°C),RH (%)',
      '2025-01-13 08:00,3.5,90',
      '2025-01-13 08:15,3.6,91',
    ].join('\n');
    const { summary, readings } = await readText(text);
    expect(summary.detected.preambleLines).toBe(4);
    expect(summary.detected.hasHeader).toBe(true);
    expect(summary.detected.loggerHint).toBe('K-01');
    expect(summary.detected.humidityColumn).toBe('RH (%)');
    expect(readings.map((r) => r.line)).toEqual([6, 7]);
  });

  it('reads a preamble line with a date in it as preamble, not as data', async () => {
    const text = 'Exported;2025-01-20 09:12\nSerial no.;40177\nTime;Temp °C;RH\n2025-01-13 08:00;3,5;90\n2025-01-13 08:15;3,6;90\n';
    const { summary } = await readText(text);
    expect(summary.detected.preambleLines).toBe(2);
    expect(summary.detected.loggerHint).toBe('40177');
    expect(summary.rows.accepted).toBe(2);
  });

  it('reads a file with no header row, taking the first numeric column after the time as temperature', async () => {
    const { summary, readings } = await readText('2025-01-13 08:00,3.5\n2025-01-13 08:15,3.6\n', { unit: 'C' });
    expect(summary.detected.hasHeader).toBe(false);
    expect(summary.detected.columns).toEqual(['column 1', 'column 2']);
    expect(summary.detected.temperature.columnSource).toBe('position (no header)');
    expect(readings.map((r) => r.line)).toEqual([1, 2]);
  });

  it('folds a units row under the header into the names', async () => {
    const { summary } = await readText('Time;Temp;RH\n;°F;%\n2025-01-13 08:00;38,3;90\n');
    expect(summary.detected.columns).toEqual(['Time', 'Temp °F', 'RH %']);
    expect(summary.detected.temperature.unit).toBe('F');
    expect(summary.detected.temperature.unitSource).toBe('header');
  });

  it('skips a record-number column and takes the only numeric column as temperature', async () => {
    const { summary } = await readText('#\tStamp\tValue\n1\t2025-01-13 08:00\t3.5\n2\t2025-01-13 08:10\t3.6\n3\t2025-01-13 08:20\t3.7\n', {
      unit: 'C',
    });
    expect(summary.detected.temperature.column).toBe('Value');
    expect(summary.detected.temperature.columnSource).toBe('only numeric column');
  });

  it('does not take a dew point column for the temperature', async () => {
    const { summary } = await readText('Time,Dew point °C,Air temp °C\n2025-01-13 08:00,1.2,3.5\n');
    expect(summary.detected.temperature.column).toBe('Air temp °C');
  });
});
