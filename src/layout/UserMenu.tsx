import { useEffect, useId, useRef, useState } from 'react';
import { Link, useLocation } from 'react-router-dom';
import { UnitPreference } from '../account/UnitPreference';
import { useSignOut } from '../auth/queries';
import { useCurrentSession } from '../auth/useCurrentSession';
import { useMeta } from '../meta/queries';
import { Button } from '../ui/Button';
import { ErrorNotice } from '../ui/ErrorNotice';
import { RoleBadge } from '../ui/RoleBadge';

function initials(name: string): string {
  return name
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, 2)
    .map((part) => part[0]!.toUpperCase())
    .join('');
}

const menuLink = 'block rounded px-2 py-2 text-slate underline-offset-4 hover:bg-frost hover:underline';

/** A disclosure (button + panel) rather than an ARIA menu: it holds a form control, which a menu may not. */
export function UserMenu() {
  const { user, nursery } = useCurrentSession();
  const meta = useMeta();
  const signOut = useSignOut();
  const location = useLocation();
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const wrapper = useRef<HTMLDivElement>(null);
  const button = useRef<HTMLButtonElement>(null);

  useEffect(() => setOpen(false), [location.pathname]);

  useEffect(() => {
    if (!open) return;
    const onKey = (e: KeyboardEvent) => {
      if (e.key !== 'Escape') return;
      setOpen(false);
      button.current?.focus();
    };
    const onPointer = (e: PointerEvent) => {
      if (!wrapper.current?.contains(e.target as Node)) setOpen(false);
    };
    document.addEventListener('keydown', onKey);
    document.addEventListener('pointerdown', onPointer);
    return () => {
      document.removeEventListener('keydown', onKey);
      document.removeEventListener('pointerdown', onPointer);
    };
  }, [open]);

  return (
    <div ref={wrapper} className="relative">
      <button
        ref={button}
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen((o) => !o)}
        className="flex min-h-11 items-center gap-2 rounded-md px-2 text-paper hover:bg-slate"
      >
        <span aria-hidden="true" className="grid size-8 place-items-center rounded-full bg-callus-light text-sm font-bold text-ink">
          {initials(user.name)}
        </span>
        <span className="sr-only sm:not-sr-only">{user.name}</span>
        <span className="sr-only">, account menu</span>
        <span aria-hidden="true" className="text-xs">▾</span>
      </button>
      <div
        id={panelId}
        hidden={!open}
        className="absolute right-0 z-40 mt-2 w-72 max-w-[calc(100vw-1rem)] rounded-lg border border-frost-deep bg-white p-4 text-ink shadow-lg"
      >
        <p className="font-semibold break-words">{user.name}</p>
        <p className="text-sm break-words text-ink-soft">{user.email}</p>
        <p className="mt-1 flex items-center gap-2 text-sm">
          <RoleBadge role={user.role} /> <span className="break-words">at {nursery.name}</span>
        </p>
        <hr className="my-3 border-frost-deep" />
        <UnitPreference />
        <hr className="my-3 border-frost-deep" />
        <nav aria-label="Account">
          <Link to="/account" className={menuLink}>
            Change password
          </Link>
          {meta.data?.devMail && (
            <Link to="/dev/mail" className={menuLink}>
              Captured mail
            </Link>
          )}
        </nav>
        <Button
          variant="secondary"
          className="mt-3 w-full"
          busy={signOut.isPending}
          busyLabel="Signing out…"
          onClick={() => signOut.mutate()}
        >
          Sign out
        </Button>
        {signOut.isError && <ErrorNotice title="Could not sign out" error={signOut.error} />}
      </div>
    </div>
  );
}
