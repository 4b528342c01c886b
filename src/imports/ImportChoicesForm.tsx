import { useLoggers } from '../loggers/queries';
import { Field, Input, Select } from '../ui/Field';
import type { ImportChoices } from './queries';

/** Overrides for what the reader detected; each left empty keeps the detected value. */
export function ImportChoicesForm({ choices, onChange }: { choices: ImportChoices; onChange: (next: ImportChoices) => void }) {
  const loggers = useLoggers();
  const set = <K extends keyof ImportChoices>(key: K, value: ImportChoices[K]) => onChange({ ...choices, [key]: value });
  return (
    <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
      <Field label="Logger" hint="Which logger the file came from.">
        {(p) => (
          <Select {...p} value={choices.logger} onChange={(e) => set('logger', e.target.value)}>
            <option value="">As named in the file</option>
            {loggers.data?.map((l) => (
              <option key={l.id} value={l.label}>
                {l.label}
                {l.serial ? ` (${l.serial})` : ''}
              </option>
            ))}
          </Select>
        )}
      </Field>
      <Field label="Time zone of the logger's clock" hint="Only for times written without an offset, e.g. Europe/Berlin or +01:00.">
        {(p) => <Input {...p} value={choices.tz} placeholder="The nursery's zone" onChange={(e) => set('tz', e.target.value)} />}
      </Field>
      <Field label="Temperature unit">
        {(p) => (
          <Select {...p} value={choices.unit} onChange={(e) => set('unit', e.target.value as ImportChoices['unit'])}>
            <option value="">As detected</option>
            <option value="C">°C</option>
            <option value="F">°F</option>
          </Select>
        )}
      </Field>
      <Field label="Date order">
        {(p) => (
          <Select {...p} value={choices.dateOrder} onChange={(e) => set('dateOrder', e.target.value as ImportChoices['dateOrder'])}>
            <option value="">As detected</option>
            <option value="dmy">Day / month / year</option>
            <option value="mdy">Month / day / year</option>
            <option value="ymd">Year / month / day</option>
          </Select>
        )}
      </Field>
    </div>
  );
}
