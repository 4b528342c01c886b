import { useRef } from 'react';
import { NavLink, Outlet } from 'react-router-dom';
import { useCurrentSession } from '../auth/useCurrentSession';
import { AlertCountBadge } from './AlertCountBadge';
import { Brand } from './Brand';
import { MoreIcon } from './icons';
import { NAV_ITEMS } from './navItems';
import { SkipLink } from './SkipLink';
import { useFocusOnNavigate } from './useFocusOnNavigate';
import { UserMenu } from './UserMenu';

const topLink = ({ isActive }: { isActive: boolean }) =>
  `rounded-md px-3 py-2 font-semibold ${isActive ? 'bg-paper text-slate-deep' : 'text-paper hover:bg-slate'}`;
const bottomLink = ({ isActive }: { isActive: boolean }) =>
  `flex min-h-14 flex-1 flex-col items-center justify-center gap-0.5 text-sm font-semibold ${isActive ? 'bg-frost text-slate-deep' : 'text-paper'}`;

/**
 * Wide screens: one top bar with the sections. Phones: brand and account on top, sections in a bar under the thumb,
 * sticky rather than fixed so it never covers the end of the page.
 */
export function AppFrame() {
  const { nursery } = useCurrentSession();
  const main = useRef<HTMLElement>(null);
  useFocusOnNavigate(main);
  return (
    <div className="flex min-h-dvh flex-col">
      <SkipLink />
      <header className="bg-slate-deep text-paper">
        <div className="mx-auto flex max-w-7xl items-center gap-4 px-4 py-2">
          <div className="flex min-w-0 flex-col">
            <Brand />
            <span className="truncate text-sm text-frost">{nursery.name}</span>
          </div>
          <nav aria-label="Sections" className="ml-2 hidden flex-wrap gap-1 lg:flex">
            {NAV_ITEMS.map(({ to, label }) => (
              <NavLink key={to} to={to} className={topLink}>
                {label}
                {to === '/alerts' && <AlertCountBadge />}
              </NavLink>
            ))}
          </nav>
          <div className="ml-auto">
            <UserMenu />
          </div>
        </div>
      </header>
      <main ref={main} id="main" tabIndex={-1} className="mx-auto w-full max-w-6xl flex-1 px-4 py-6 focus:outline-none sm:py-8">
        <Outlet />
      </main>
      <nav aria-label="Sections" className="sticky bottom-0 z-30 flex border-t border-slate bg-slate-deep lg:hidden">
        {NAV_ITEMS.filter((item) => item.onPhoneBar).map(({ to, label, Icon }) => (
          <NavLink key={to} to={to} className={bottomLink}>
            <Icon />
            <span>
              {label}
              {to === '/alerts' && <AlertCountBadge />}
            </span>
          </NavLink>
        ))}
        <NavLink to="/more" className={bottomLink}>
          <MoreIcon />
          More
        </NavLink>
      </nav>
    </div>
  );
}
