import { Link } from 'react-router-dom';
import { PageHeader } from '../ui/PageHeader';
import { NAV_ITEMS } from './navItems';

/** On phones the bottom bar holds the daily sections; this page lists every section, one large tap each. */
export function MoreSectionsPage() {
  return (
    <>
      <PageHeader title="All sections" />
      <ul className="grid grid-cols-1 gap-3 sm:grid-cols-2">
        {NAV_ITEMS.map(({ to, label, Icon }) => (
          <li key={to}>
            <Link to={to} className="flex min-h-14 items-center gap-3 rounded-lg border border-frost-deep bg-white px-4 py-3 text-lg font-semibold text-slate-deep hover:bg-frost">
              <Icon />
              {label}
            </Link>
          </li>
        ))}
      </ul>
    </>
  );
}
