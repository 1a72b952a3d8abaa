import { NavLink, Outlet } from 'react-router-dom';
import { useMe } from '../api/useMe.ts';
import { paths } from '../routes/paths.ts';
import { HealthMark } from './HealthMark.tsx';
import { UnitPreference } from './UnitPreference.tsx';
import { UserMenu } from './UserMenu.tsx';
import { Wordmark } from './Wordmark.tsx';

const navLinkClass = ({ isActive }: { isActive: boolean }) =>
  `px-2 py-1 text-sm ${isActive ? 'text-pencil underline decoration-2 underline-offset-4' : 'text-graphite hover:text-pencil'}`;

/** The frame around every page: title strip, navigation, the page, and a quiet footer. */
export function AppShell() {
  const me = useMe();
  return (
    <div className="flex min-h-screen flex-col">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:bg-sheet focus:p-2">
        Skip to content
      </a>
      <header className="no-print border-b border-rule bg-paper/90 backdrop-blur">
        <div className="mx-auto flex max-w-[1600px] items-center justify-between gap-4 px-4 py-2.5">
          <NavLink to={me.data ? paths.workshops : paths.home} className="flex items-center gap-2" aria-label="Casewright home">
            <Wordmark />
          </NavLink>
          <nav aria-label="Main" className="flex items-center gap-1">
            <NavLink to={paths.home} end className={navLinkClass}>
              About
            </NavLink>
            {me.data && (
              <NavLink to={paths.workshops} className={navLinkClass}>
                Workshop
              </NavLink>
            )}
          </nav>
          <div className="ml-auto flex items-center gap-4">
            <UnitPreference compact />
            <UserMenu />
          </div>
        </div>
      </header>
      <main id="main" className="flex flex-1 flex-col">
        <Outlet />
      </main>
      <footer className="no-print border-t border-rule">
        <div className="mx-auto flex max-w-[1600px] flex-wrap items-center justify-between gap-2 px-4 py-2 text-xs text-graphite-soft">
          <span>
            Casewright computes; you decide. Check every drawing against your stock, your tools and local codes before you cut.
          </span>
          <HealthMark />
        </div>
      </footer>
    </div>
  );
}
