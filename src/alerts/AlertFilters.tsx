import { ALERT_RULES, RULE_TITLES, SEVERITIES } from '../../shared/alerts/rules';
import { ALERT_STATUSES, type AlertListQuery } from '../../shared/schemas/alerts';
import type { Room } from '../rooms/queries';
import { Field, Select } from '../ui/Field';
import { SEVERITY_LABEL, STATUS_LABEL } from './alertLabels';

interface AlertFiltersProps {
  filters: AlertListQuery;
  onChange: (next: AlertListQuery) => void;
  rooms: Room[];
}

type FilterKey = 'status' | 'rule' | 'severity' | 'roomId';

/** The filters live in the address, so "open freeze alerts in the garage" can be bookmarked. */
export function AlertFilters({ filters, onChange, rooms }: AlertFiltersProps) {
  const choices: { key: FilterKey; label: string; any: string; options: [string, string][] }[] = [
    { key: 'status', label: 'Status', any: 'Any status', options: ALERT_STATUSES.map((s) => [s, STATUS_LABEL[s]]) },
    { key: 'rule', label: 'Rule', any: 'Any rule', options: ALERT_RULES.map((r) => [r, RULE_TITLES[r]]) },
    { key: 'severity', label: 'Severity', any: 'Any severity', options: SEVERITIES.map((s) => [s, SEVERITY_LABEL[s]]) },
    { key: 'roomId', label: 'Room', any: 'Any room', options: rooms.map((r) => [String(r.id), r.name]) },
  ];
  return (
    <form role="search" aria-label="Filter alerts" className="mb-6 grid gap-4 sm:grid-cols-2 lg:grid-cols-4" onSubmit={(e) => e.preventDefault()}>
      {choices.map(({ key, label, any, options }) => (
        <Field key={key} label={label}>
          {(c) => (
            <Select {...c} value={filters[key] === undefined ? '' : String(filters[key])} onChange={(e) => onChange({ ...filters, [key]: e.target.value || undefined, before: undefined })}>
              <option value="">{any}</option>
              {options.map(([value, text]) => (
                <option key={value} value={value}>
                  {text}
                </option>
              ))}
            </Select>
          )}
        </Field>
      ))}
    </form>
  );
}
