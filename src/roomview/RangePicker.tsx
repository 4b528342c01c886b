import { useId } from 'react';
import { PRESETS, type PresetKey } from './rangePresets';

export type RangeChoice = PresetKey | 'custom';
const CHOICES: { key: RangeChoice; label: string }[] = [...PRESETS, { key: 'custom', label: 'Custom' }];

/** Radio buttons drawn as a segmented switch, large enough for gloved fingers. */
export function RangePicker({ value, onChange }: { value: RangeChoice; onChange: (choice: RangeChoice) => void }) {
  const group = useId();
  return (
    <fieldset>
      <legend className="sr-only">Range shown</legend>
      <div className="flex flex-wrap gap-1 rounded-md border border-slate/40 bg-white p-0.5">
        {CHOICES.map((c) => (
          <label
            key={c.key}
            className="flex min-h-10 cursor-pointer items-center rounded px-3 font-semibold text-slate has-checked:bg-slate has-checked:text-paper has-focus-visible:outline-3 has-focus-visible:outline-ice"
          >
            <input type="radio" name={group} value={c.key} checked={value === c.key} onChange={() => onChange(c.key)} className="sr-only" />
            {c.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
