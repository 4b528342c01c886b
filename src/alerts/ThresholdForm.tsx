import { useState, type FormEvent, type ReactNode } from 'react';
import type { z } from 'zod';
import type { AlertThresholds, ThresholdsPatch } from '../../shared/schemas/alerts';
import type { TemperatureUnit } from '../../shared/schemas/common';
import { Field, Input, Select } from '../ui/Field';
import { FormActions } from '../ui/FormActions';
import { describeThreshold, fromShown, toShown, unitLabel, type ThresholdField } from './thresholdFields';

type BudgetMode = 'inherit' | 'off' | 'limit';

interface ThresholdFormProps {
  fields: ThresholdField[];
  /** What this scope stores now; a key left out follows `inherited`. */
  stored: Partial<AlertThresholds>;
  inherited: AlertThresholds;
  inheritedFrom: string;
  unit: TemperatureUnit;
  schema: z.ZodType;
  onSave: (patch: ThresholdsPatch) => void;
  busy: boolean;
  error: unknown;
  saved: boolean;
  submitLabel: string;
  children?: ReactNode;
}

/**
 * One scope's thresholds (the nursery's or a room's). An empty box follows what is inherited; the budget can also be
 * switched off here, which is a value of its own (null), not "inherit".
 */
export function ThresholdForm(props: ThresholdFormProps) {
  const { fields, stored, inherited, inheritedFrom, unit } = props;
  const [values, setValues] = useState<Record<string, string>>(() =>
    Object.fromEntries(fields.map((f) => [f.key, typeof stored[f.key] === 'number' ? String(toShown(f.key, stored[f.key] as number, unit)) : ''])),
  );
  const [budgetMode, setBudgetMode] = useState<BudgetMode>(() =>
    !('exposureBudgetDegreeHours' in stored) ? 'inherit' : stored.exposureBudgetDegreeHours === null ? 'off' : 'limit',
  );
  const [errors, setErrors] = useState<Record<string, string>>({});

  function submit(e: FormEvent) {
    e.preventDefault();
    const set: Record<string, number | null> = {};
    const reset: string[] = [];
    for (const f of fields) {
      const text = values[f.key].trim();
      if (f.key === 'exposureBudgetDegreeHours' && budgetMode !== 'limit') {
        if (budgetMode === 'off') set[f.key] = null;
        else reset.push(f.key);
      } else if (text === '') reset.push(f.key);
      else set[f.key] = fromShown(f.key, Number(text), unit);
    }
    const parsed = props.schema.safeParse({ set, reset: reset.filter((k) => k in stored) });
    if (!parsed.success) {
      setErrors(Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[1] ?? i.path[0]), 'Enter a number within the allowed range'])));
      return;
    }
    setErrors({});
    props.onSave(parsed.data as ThresholdsPatch);
  }

  return (
    <form noValidate onSubmit={submit} className="flex flex-col gap-4">
      <div className="grid gap-4 sm:grid-cols-2">
        {fields.map((f) => {
          const inheritedText = `${inheritedFrom}: ${describeThreshold(f, inherited[f.key], unit)}`;
          if (f.key === 'exposureBudgetDegreeHours') {
            return (
              <fieldset key={f.key} className="flex flex-col gap-1">
                <legend className="font-semibold">{f.label}</legend>
                <p className="text-sm text-ink-soft">{f.hint}</p>
                <Select aria-label={`${f.label}: how it is set`} value={budgetMode} onChange={(e) => setBudgetMode(e.target.value as BudgetMode)}>
                  <option value="inherit">As inherited ({inheritedText})</option>
                  <option value="off">Off here</option>
                  <option value="limit">A limit of…</option>
                </Select>
                {budgetMode === 'limit' && (
                  <Input
                    aria-label={`${f.label} in ${unitLabel(f, unit)}`}
                    aria-invalid={errors[f.key] ? true : undefined}
                    inputMode="decimal"
                    value={values[f.key]}
                    onChange={(e) => setValues({ ...values, [f.key]: e.target.value })}
                  />
                )}
                {errors[f.key] && <p className="text-sm font-semibold text-ember">{errors[f.key]}</p>}
              </fieldset>
            );
          }
          return (
            <Field key={f.key} label={`${f.label} (${unitLabel(f, unit)})`} hint={`${f.hint} Empty: ${inheritedText}.`} error={errors[f.key]}>
              {(c) => <Input {...c} inputMode="decimal" placeholder={describeThreshold(f, inherited[f.key], unit)} value={values[f.key]} onChange={(e) => setValues({ ...values, [f.key]: e.target.value })} />}
            </Field>
          );
        })}
      </div>
      <FormActions submitLabel={props.submitLabel} busyLabel="Saving…" busy={props.busy} error={props.error} success={props.saved && 'Saved.'} />
      {props.children}
    </form>
  );
}
