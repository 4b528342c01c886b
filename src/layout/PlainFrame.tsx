import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Brand } from './Brand';
import { SkipLink } from './SkipLink';

/** The frame of pages outside the signed-in app (sign-in, invitations, captured mail): brand bar and one main region. */
export function PlainFrame({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col">
      <SkipLink />
      <header className="bg-slate-deep px-4 py-3 text-paper">
        <div className="mx-auto max-w-5xl">
          <Link to="/" className="inline-block rounded-md">
            <Brand />
          </Link>
        </div>
      </header>
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-5xl flex-1 px-4 py-8 focus:outline-none">
        {children}
      </main>
    </div>
  );
}
