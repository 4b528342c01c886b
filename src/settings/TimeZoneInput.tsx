import { useId, type ComponentProps } from 'react';
import { knownTimeZones } from '../time/nurseryTime';
import { Input } from '../ui/Field';

/** Free text with the runtime's IANA zones as suggestions: typing "Chic" finds America/Chicago. */
export function TimeZoneInput(props: Omit<ComponentProps<'input'>, 'list'>) {
  const listId = useId();
  return (
    <>
      <Input {...props} list={listId} autoComplete="off" spellCheck={false} />
      <datalist id={listId}>
        {knownTimeZones().map((zone) => (
          <option key={zone} value={zone} />
        ))}
      </datalist>
    </>
  );
}
