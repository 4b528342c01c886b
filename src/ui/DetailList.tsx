import type { ReactNode } from 'react';

/** Label–value pairs, side by side on wide screens and stacked on phones. */
export function DetailList({ items }: { items: { label: string; value: ReactNode; figure?: boolean }[] }) {
  return (
    <dl className="grid grid-cols-1 gap-x-6 gap-y-0.5 sm:grid-cols-[max-content_1fr] sm:gap-y-3">
      {items.map((item) => (
        <div key={item.label} className="contents">
          <dt className="font-semibold text-ink-soft">{item.label}</dt>
          <dd className={`mb-2.5 min-w-0 break-words whitespace-pre-line sm:mb-0 ${item.figure ? 'font-mono' : ''}`}>{item.value}</dd>
        </div>
      ))}
    </dl>
  );
}
