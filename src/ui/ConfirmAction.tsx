import { useState } from 'react';
import { Button } from './Button';
import { ErrorNotice } from './ErrorNotice';

interface ConfirmActionProps {
  /** The button that starts it: "Delete". */
  label: string;
  /** The question asked in place: "Delete Root cellar?". */
  question: string;
  confirmLabel: string;
  busy: boolean;
  onConfirm: () => void;
  /** Why the server refused, with a title saying what did not happen: "Not removed". */
  error?: unknown;
  errorTitle?: string;
  size?: 'sm' | 'md';
}

/** Destructive actions ask once, in place, instead of a browser dialog that hides the page and traps focus oddly. */
export function ConfirmAction({ label, question, confirmLabel, busy, onConfirm, error, errorTitle, size = 'md' }: ConfirmActionProps) {
  const [asking, setAsking] = useState(false);
  return (
    <div className="flex flex-col items-start gap-2">
      {asking ? (
        <div role="group" aria-label={question} className="flex flex-wrap items-center gap-2 rounded-md bg-ember-light px-3 py-2">
          <span className="text-sm font-semibold">{question}</span>
          <Button variant="danger" size="sm" busy={busy} busyLabel="Working…" onClick={onConfirm} autoFocus>
            {confirmLabel}
          </Button>
          <Button variant="secondary" size="sm" onClick={() => setAsking(false)} disabled={busy}>
            Keep it
          </Button>
        </div>
      ) : (
        <Button variant="secondary" size={size} onClick={() => setAsking(true)}>
          {label}
        </Button>
      )}
      {error ? <ErrorNotice title={errorTitle} error={error} /> : null}
    </div>
  );
}
