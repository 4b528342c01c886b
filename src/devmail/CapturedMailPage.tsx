import { Link, useParams } from 'react-router-dom';
import { useSession } from '../auth/queries';
import { useMeta } from '../meta/queries';
import { browserTimeZone, formatInstant } from '../time/nurseryTime';
import { EmptyState } from '../ui/EmptyState';
import { PageHeader } from '../ui/PageHeader';
import { QueryResult } from '../ui/QueryResult';
import { MailMessage } from './MailMessage';
import { useCapturedMail, type CapturedMail } from './queries';

function MailList({ list, selected, zone }: { list: CapturedMail[]; selected: string | undefined; zone: string }) {
  return (
    <nav aria-label="Messages">
      <ul className="flex flex-col gap-2">
        {list.map((m) => (
          <li key={m.id}>
            <Link
              to={`/dev/mail/${encodeURIComponent(m.id)}`}
              aria-current={m.id === selected ? 'page' : undefined}
              className="block rounded-md border border-frost-deep bg-white px-3 py-2 hover:bg-frost aria-[current=page]:border-slate aria-[current=page]:bg-frost"
            >
              <span className="block font-semibold break-words">{m.subject || '(no subject)'}</span>
              <span className="block text-sm break-all text-ink-soft">to {m.to.join(', ')}</span>
              <span className="block font-mono text-xs text-ink-soft">{formatInstant(m.receivedAt, zone)}</span>
            </Link>
          </li>
        ))}
      </ul>
    </nav>
  );
}

/** A development aid: the mail this server would have sent, caught on loopback instead of delivered. */
export function CapturedMailPage() {
  const { mailId } = useParams();
  const meta = useMeta();
  const session = useSession();
  const enabled = meta.data?.devMail === true;
  const mail = useCapturedMail(enabled);
  const zone = session.data?.nursery.timeZone ?? browserTimeZone();
  const back = session.data ? { to: '/rooms', label: 'Back to Coldknit' } : { to: '/sign-in', label: 'Sign in' };
  return (
    <>
      <PageHeader title="Captured mail" description="Development only: messages this server sent are kept here instead of being delivered." back={back} />
      <QueryResult query={meta} loading="Checking the server…" failed="Could not reach the server">
        {(m) =>
          !m.devMail ? (
            <EmptyState title="Mail capture is off">This server delivers mail through its SMTP provider, so nothing is kept here.</EmptyState>
          ) : (
            <QueryResult query={mail} loading="Loading messages…" failed="Could not load the captured mail">
              {(list) => {
                if (list.length === 0) return <EmptyState title="No mail yet">Messages appear here a moment after the server sends them.</EmptyState>;
                const open = list.find((x) => x.id === mailId);
                return (
                  <div className="grid gap-6 md:grid-cols-[minmax(0,1fr)_minmax(0,2fr)]">
                    <div className={open ? 'hidden md:block' : ''}>
                      <MailList list={list} selected={mailId} zone={zone} />
                    </div>
                    <div className={`min-w-0 rounded-lg border border-frost-deep bg-white p-4 ${open ? '' : 'hidden md:block'}`}>
                      {open ? (
                        <>
                          <Link to="/dev/mail" className="mb-3 inline-block text-sm text-slate underline underline-offset-4 md:hidden">
                            ← All messages
                          </Link>
                          <MailMessage key={open.id} mail={open} zone={zone} />
                        </>
                      ) : (
                        <p className="text-ink-soft">{mailId ? 'That message is no longer here.' : 'Choose a message to read it.'}</p>
                      )}
                    </div>
                  </div>
                );
              }}
            </QueryResult>
          )
        }
      </QueryResult>
    </>
  );
}
