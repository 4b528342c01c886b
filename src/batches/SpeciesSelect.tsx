import type { ComponentProps } from 'react';
import type { ListedProfile } from '../profiles/queries';
import { Select } from '../ui/Field';

/** Built-in species first, then the nursery's own profiles, each group labelled. */
export function SpeciesSelect({ profiles, placeholder, ...rest }: ComponentProps<'select'> & { profiles: ListedProfile[]; placeholder?: string }) {
  const group = (origin: ListedProfile['origin']) => profiles.filter((p) => p.origin === origin);
  return (
    <Select {...rest}>
      {placeholder !== undefined && <option value="">{placeholder}</option>}
      <optgroup label="Built-in">
        {group('built-in').map((p) => (
          <option key={p.key} value={p.key}>
            {p.name}
          </option>
        ))}
      </optgroup>
      {group('nursery').length > 0 && (
        <optgroup label="This nursery's profiles">
          {group('nursery').map((p) => (
            <option key={p.key} value={p.key}>
              {p.name}
            </option>
          ))}
        </optgroup>
      )}
    </Select>
  );
}

/** The profile's name for a key, or the key itself while profiles load. */
export const speciesName = (profiles: ListedProfile[] | undefined, key: string) => profiles?.find((p) => p.key === key)?.name ?? key;
