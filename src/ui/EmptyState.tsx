import type { ReactNode } from 'react';

export function EmptyState({ title, children, action }: { title: string; children?: ReactNode; action?: ReactNode }) {
  return (
    <div className="rounded-lg border border-dashed border-slate/40 bg-white/60 px-5 py-8 text-center">
      <p className="text-lg font-semibold text-slate-deep">{title}</p>
      {children && <div className="mx-auto mt-1 max-w-prose text-ink-soft">{children}</div>}
      {action && <div className="mt-4 flex justify-center">{action}</div>}
    </div>
  );
}
