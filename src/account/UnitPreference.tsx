import { useId } from 'react';
import { TEMPERATURE_UNITS, type TemperatureUnit } from '../../shared/schemas/common';
import { useSetUnit } from '../auth/queries';
import { useCurrentSession } from '../auth/useCurrentSession';
import { ErrorNotice } from '../ui/ErrorNotice';

const UNIT_LABEL: Record<TemperatureUnit, string> = { C: '°C', F: '°F' };

/** Two radio buttons drawn as a switch; the choice is saved at once and applies to every page. */
export function UnitPreference() {
  const { user } = useCurrentSession();
  const setUnit = useSetUnit();
  // The switch appears in the account menu and on the account page at once; each needs its own radio group.
  const group = useId();
  const shown = setUnit.isPending ? setUnit.variables.unit : user.unit;
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 text-sm font-semibold text-ink-soft">Temperatures in</legend>
      <div className="inline-flex w-max rounded-md border border-slate/40 bg-white p-0.5">
        {TEMPERATURE_UNITS.map((unit) => (
          <label
            key={unit}
            className="relative cursor-pointer rounded px-4 py-1.5 font-mono font-semibold text-slate has-checked:bg-slate has-checked:text-paper has-focus-visible:outline-3 has-focus-visible:outline-ice"
          >
            <input
              type="radio"
              name={group}
              value={unit}
              checked={shown === unit}
              onChange={() => setUnit.mutate({ unit })}
              // Transparent over the whole label, so the real radio button takes the click and keeps its keyboard behaviour.
              className="absolute inset-0 cursor-pointer opacity-0"
            />
            {UNIT_LABEL[unit]}
          </label>
        ))}
      </div>
      {setUnit.isError && <ErrorNotice title="Could not save the unit" error={setUnit.error} />}
    </fieldset>
  );
}
