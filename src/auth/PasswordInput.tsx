import { useState, type ComponentProps } from 'react';
import { Input } from '../ui/Field';

/** A password box with a show/hide switch: long passphrases are easier to type when you can see them. */
export function PasswordInput(props: Omit<ComponentProps<'input'>, 'type'>) {
  const [visible, setVisible] = useState(false);
  return (
    <div className="flex gap-2">
      <Input {...props} type={visible ? 'text' : 'password'} className="flex-1" />
      <button
        type="button"
        onClick={() => setVisible((v) => !v)}
        aria-pressed={visible}
        aria-label={visible ? 'Hide password' : 'Show password'}
        className="min-h-11 shrink-0 rounded-md border border-slate/40 bg-white px-3 text-sm font-semibold text-slate hover:bg-frost"
      >
        {visible ? 'Hide' : 'Show'}
      </button>
    </div>
  );
}
