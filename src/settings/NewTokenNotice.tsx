import { useState } from 'react';
import { Button } from '../ui/Button';
import type { CreatedToken } from './queries';

/** The one moment the secret exists outside the server: make copying it easy and say plainly that it will not return. */
export function NewTokenNotice({ token, origin, onDone }: { token: CreatedToken; origin: string; onDone: () => void }) {
  const [copied, setCopied] = useState<'yes' | 'failed' | null>(null);
  const copy = () =>
    navigator.clipboard.writeText(token.token).then(
      () => setCopied('yes'),
      () => setCopied('failed'),
    );
  return (
    <section aria-labelledby="new-token-heading" className="rounded-lg border-2 border-callus bg-callus-light/60 p-4">
      <h3 id="new-token-heading" className="font-bold text-slate-deep">
        Token “{token.name}” created
      </h3>
      <p className="mt-1 font-semibold">Copy it now: you will not see this token again.</p>
      <div className="mt-3 flex flex-col gap-2 sm:flex-row sm:items-center">
        <code aria-label="New API token" className="min-w-0 flex-1 rounded-md border border-slate/30 bg-white px-3 py-2 font-mono text-sm break-all select-all">
          {token.token}
        </code>
        <Button variant="primary" onClick={() => void copy()}>
          Copy token
        </Button>
      </div>
      <p role="status" className="mt-1 text-sm empty:hidden">
        {copied === 'yes' ? 'Copied to the clipboard.' : copied === 'failed' ? 'Could not copy; select the token and copy it by hand.' : ''}
      </p>
      <div className="mt-3 text-sm">
        <p>Use it from the command line on the computer that reads the loggers:</p>
        <pre className="mt-1 rounded-md bg-slate-deep px-3 py-2 font-mono break-all whitespace-pre-wrap text-frost">
          <code>coldknit login --server {origin}</code>
        </pre>
        <p className="mt-2">and paste the token when asked, or set these instead (for scheduled imports):</p>
        <pre className="mt-1 rounded-md bg-slate-deep px-3 py-2 font-mono break-all whitespace-pre-wrap text-frost">
          <code>{`COLDKNIT_SERVER=${origin}\nCOLDKNIT_TOKEN=<the token>`}</code>
        </pre>
      </div>
      <Button variant="secondary" size="sm" className="mt-3" onClick={onDone}>
        I have saved it
      </Button>
    </section>
  );
}
