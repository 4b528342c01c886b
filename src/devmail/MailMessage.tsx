import { useState } from 'react';
import { formatInstant } from '../time/nurseryTime';
import { DetailList } from '../ui/DetailList';
import type { CapturedMail } from './queries';

const LINK = /https?:\/\/[^\s<>"')]+/g;

/**
 * The HTML part runs in an iframe with an empty sandbox (no scripts, no navigation, its own origin), so a message
 * can neither act on this page nor be clicked through; its links are therefore listed from the text part as real links.
 */
export function MailMessage({ mail, zone }: { mail: CapturedMail; zone: string }) {
  const [view, setView] = useState<'html' | 'text'>(mail.html ? 'html' : 'text');
  const links = [...new Set(mail.text.match(LINK) ?? [])];
  return (
    <article aria-labelledby="mail-subject" className="flex flex-col gap-4">
      <h2 id="mail-subject" className="text-xl font-bold break-words text-slate-deep">
        {mail.subject || '(no subject)'}
      </h2>
      <DetailList
        items={[
          { label: 'From', value: mail.from },
          { label: 'To', value: mail.to.join(', ') },
          { label: 'Received', value: formatInstant(mail.receivedAt, zone), figure: true },
        ]}
      />
      {links.length > 0 && (
        <div>
          <h3 className="font-semibold text-ink-soft">Links in this message</h3>
          <ul className="mt-1 flex flex-col gap-1">
            {links.map((href) => (
              <li key={href}>
                <a href={href} className="font-mono text-sm break-all text-slate underline underline-offset-4">
                  {href}
                </a>
              </li>
            ))}
          </ul>
        </div>
      )}
      {mail.html && (
        <div role="group" aria-label="Show the message as" className="flex gap-2">
          {(['html', 'text'] as const).map((v) => (
            <button
              key={v}
              type="button"
              aria-pressed={view === v}
              onClick={() => setView(v)}
              className="min-h-9 rounded-md border border-slate/40 px-3 text-sm font-semibold text-slate aria-pressed:bg-slate aria-pressed:text-paper"
            >
              {v === 'html' ? 'Formatted' : 'Plain text'}
            </button>
          ))}
        </div>
      )}
      {view === 'html' && mail.html ? (
        <iframe title={`Message: ${mail.subject}`} sandbox="" srcDoc={mail.html} className="h-96 w-full rounded-md border border-frost-deep bg-white" />
      ) : (
        <pre className="rounded-md border border-frost-deep bg-white p-3 font-mono text-sm break-words whitespace-pre-wrap">{mail.text}</pre>
      )}
    </article>
  );
}
