import { useId, type ReactNode } from 'react';

/** A titled region of a page; the heading names the region for landmark navigation. */
export function Panel({ title, description, actions, children }: { title: string; description?: ReactNode; actions?: ReactNode; children: ReactNode }) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className="rounded-lg border border-frost-deep bg-white p-4 shadow-sm sm:p-6">
      <div className="mb-4 flex flex-wrap items-start justify-between gap-2">
        <div>
          <h2 id={headingId} className="text-xl font-bold text-slate-deep">
            {title}
          </h2>
          {description && <div className="mt-1 text-sm text-ink-soft">{description}</div>}
        </div>
        {actions}
      </div>
      {children}
    </section>
  );
}
