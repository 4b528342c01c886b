import type { ReactNode } from 'react';
import { Button, ButtonLink } from './Button';
import { ErrorNotice } from './ErrorNotice';

interface FormActionsProps {
  submitLabel: string;
  /** Said on the button while the request runs: "Saving…". */
  busyLabel: string;
  busy: boolean;
  /** The server's refusal, shown right above the button that caused it. */
  error?: unknown;
  /** Where Cancel leads; no Cancel button without it. */
  cancelTo?: string;
  /** A confirmation read out politely once the request succeeded. */
  success?: ReactNode;
  /** Stretch the submit button on phones, for the single-purpose pages. */
  wide?: boolean;
}

/** The foot of every form: error, submit (and cancel), confirmation — in the same order and look everywhere. */
export function FormActions({ submitLabel, busyLabel, busy, error, cancelTo, success, wide = false }: FormActionsProps) {
  return (
    <div className="flex flex-col gap-3">
      {error ? <ErrorNotice error={error} /> : null}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={busy} busyLabel={busyLabel} className={wide ? 'w-full sm:w-auto' : ''}>
          {submitLabel}
        </Button>
        {cancelTo && (
          <ButtonLink to={cancelTo} variant="secondary">
            Cancel
          </ButtonLink>
        )}
      </div>
      {success ? (
        <p role="status" className="font-semibold text-moss-deep">
          {success}
        </p>
      ) : null}
    </div>
  );
}
