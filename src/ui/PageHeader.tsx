import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { usePageTitle } from './usePageTitle';

interface PageHeaderProps {
  title: string;
  description?: ReactNode;
  actions?: ReactNode;
  back?: { to: string; label: string };
}

export function PageHeader({ title, description, actions, back }: PageHeaderProps) {
  usePageTitle(title);
  return (
    <header className="mb-6 flex flex-col gap-3 sm:flex-row sm:items-end sm:justify-between">
      <div className="min-w-0">
        {back && (
          <Link to={back.to} className="mb-1 inline-block text-sm text-slate underline underline-offset-4 hover:text-slate-deep">
            <span aria-hidden="true">← </span>
            {back.label}
          </Link>
        )}
        <h1 className="text-2xl font-bold break-words text-slate-deep sm:text-3xl">{title}</h1>
        {description && <div className="mt-1 text-ink-soft">{description}</div>}
      </div>
      {actions && <div className="flex flex-wrap gap-2">{actions}</div>}
    </header>
  );
}
