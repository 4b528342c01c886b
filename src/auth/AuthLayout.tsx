import type { ReactNode } from 'react';
import { PlainFrame } from '../layout/PlainFrame';
import { usePageTitle } from '../ui/usePageTitle';

/** One calm card for the pages of people who are not signed in, with room beside it for help. */
export function AuthLayout({ title, intro, children, aside }: { title: string; intro?: ReactNode; children: ReactNode; aside?: ReactNode }) {
  usePageTitle(title);
  return (
    <PlainFrame>
      <div className="grid gap-8 md:grid-cols-[minmax(0,28rem)_minmax(0,1fr)] md:items-start">
        <div className="rounded-lg border border-frost-deep bg-white p-5 shadow-sm sm:p-7">
          <h1 className="text-2xl font-bold text-slate-deep">{title}</h1>
          {intro && <div className="mt-1 mb-5 text-ink-soft">{intro}</div>}
          {children}
        </div>
        {aside && <div className="flex flex-col gap-4">{aside}</div>}
      </div>
    </PlainFrame>
  );
}
