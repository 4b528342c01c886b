import { useState, type FormEvent } from 'react';
import { fromZonedInputValue, toZonedInputValue, zoneAbbreviation } from '../time/nurseryTime';
import { Button } from '../ui/Button';
import { Field, Input } from '../ui/Field';
import type { TimeRange } from './queries';

/** Start and end on the nursery's clock; applied together so the chart does not reload on every keystroke. */
export function CustomRangeForm({ range, timeZone, onApply }: { range: TimeRange; timeZone: string; onApply: (range: TimeRange) => void }) {
  const [from, setFrom] = useState(() => toZonedInputValue(new Date(range.from), timeZone));
  const [to, setTo] = useState(() => toZonedInputValue(new Date(range.to), timeZone));
  const [error, setError] = useState<string>();
  const zone = zoneAbbreviation(timeZone);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const start = Date.parse(fromZonedInputValue(from, timeZone));
    const end = Date.parse(fromZonedInputValue(to, timeZone));
    if (!Number.isFinite(start) || !Number.isFinite(end)) return setError('Enter both a start and an end.');
    if (end <= start) return setError('The end must come after the start.');
    setError(undefined);
    onApply({ from: start, to: end });
  };
  return (
    <form noValidate onSubmit={submit} className="flex flex-col gap-3 sm:flex-row sm:items-end">
      <Field label={`From (${zone})`} error={error}>
        {(c) => <Input {...c} type="datetime-local" value={from} onChange={(e) => setFrom(e.target.value)} />}
      </Field>
      <Field label={`To (${zone})`}>
        {(c) => <Input {...c} type="datetime-local" value={to} onChange={(e) => setTo(e.target.value)} />}
      </Field>
      <Button type="submit" variant="secondary">
        Show this range
      </Button>
    </form>
  );
}
