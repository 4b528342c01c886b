import type { Detection } from '../../shared/import/types';
import { DetailList } from '../ui/DetailList';

const DELIMITERS: Record<string, string> = { ',': 'comma', ';': 'semicolon', '\t': 'tab' };

/** What the reader found in a file, said the way a person would check it against the logger's export. */
export function DetectionSummary({ detected }: { detected: Detection }) {
  const ts = detected.timestamp;
  const order = ts.dateOrder ? `${ts.dateOrder.toUpperCase()}${ts.dateOrderInferred ? ' (worked out from the dates)' : ''}` : '—';
  return (
    <DetailList
      items={[
        { label: 'Columns', value: detected.hasHeader ? detected.columns.join(' · ') : `no header row (${detected.columns.length} columns)` },
        { label: 'Time', value: `${ts.columns.join(' + ')} — ${ts.format}` },
        { label: 'Date order', value: order },
        { label: 'Time zone', value: `${ts.zone} (${ts.zoneSource})` },
        { label: 'Temperature', value: `${detected.temperature.column} in °${detected.temperature.unit} (from ${detected.temperature.unitSource})${detected.temperature.note ? ` — ${detected.temperature.note}` : ''}` },
        { label: 'Humidity', value: detected.humidityColumn ?? 'none' },
        { label: 'File', value: `${detected.encoding}${detected.bom ? ' with BOM' : ''}, ${DELIMITERS[detected.delimiter] ?? detected.delimiter}-separated${detected.decimalComma ? ', decimal comma' : ''}, ${detected.preambleLines} preamble line(s)` },
        { label: 'Logger named in file', value: detected.loggerHint ?? '—' },
      ]}
    />
  );
}
