import clsx from 'clsx';
import { useState } from 'react';
import { NavLink, Outlet, useNavigate, useNavigation } from 'react-router';
import { ROLE_LABELS } from '../../shared/api/roles';
import { Button, focusRing } from '../components/ui';
import { useMe } from '../features/auth/api/me';
import { useLogout } from '../features/auth/api/logout';
import { BrandMark } from '../features/auth/components/BrandMark';
import { navForRole, type NavItem } from './navigation';
import { PlantMenu } from './PlantMenu';

function NavLinks({
  items,
  onNavigate,
  vertical,
}: {
  items: NavItem[];
  onNavigate?: () => void;
  vertical?: boolean;
}) {
  return (
    <ul className={clsx('flex gap-1', vertical ? 'flex-col' : 'items-center')}>
      {items.map((item) => (
        <li key={item.to}>
          <NavLink
            to={item.to}
            end={item.to === '/'}
            onClick={onNavigate}
            className={({ isActive }) =>
              clsx(
                'block rounded px-3 py-2 text-sm font-medium whitespace-nowrap transition-colors',
                isActive
                  ? 'bg-timber-700 text-white'
                  : 'text-timber-50 hover:bg-timber-700/60 hover:text-white',
                focusRing,
                'focus-visible:outline-white',
              )
            }
          >
            {item.label}
          </NavLink>
        </li>
      ))}
    </ul>
  );
}

/** The signed-in frame: brand, role navigation (collapses below 1024 px), user, Sign out. */
export function AppFrame() {
  const me = useMe().data;
  const logout = useLogout();
  const navigate = useNavigate();
  const navigation = useNavigation();
  const [menuOpen, setMenuOpen] = useState(false);
  if (!me) return null; // the route loader guarantees the session; this only narrows the type

  const items = navForRole(me.user.role);
  const main = items.filter((item) => !item.group);
  const plant = items.filter((item) => item.group === 'plant');
  // The plant manager's long bar goes inline only where it fits; the name shows where room is left.
  const wide = items.length > 8;
  const inline = wide ? 'xl' : 'lg';
  const signOut = () =>
    logout.mutate(undefined, { onSettled: () => void navigate('/sign-in', { replace: true }) });
  const who = me.customer ? `${me.customer.name}` : me.plant.name;

  return (
    <div className="flex min-h-screen flex-col">
      <a
        href="#main"
        className="sr-only z-50 rounded bg-white px-3 py-2 text-sand-900 focus:not-sr-only focus:absolute focus:top-2 focus:left-2"
      >
        Skip to content
      </a>
      <header className="bg-timber-800 text-white print:hidden">
        <div className="mx-auto flex h-14 max-w-page items-center gap-4 px-4 lg:px-6">
          <NavLink
            to="/"
            className={clsx(
              'flex items-center gap-2 rounded',
              focusRing,
              'focus-visible:outline-white',
            )}
          >
            <BrandMark className="h-7 w-7" />
            <span className="text-lg font-semibold tracking-tight">Spanwise</span>
          </NavLink>
          <nav
            aria-label="Main"
            className={clsx(
              'hidden',
              inline === 'xl' ? 'xl:flex' : 'lg:flex',
              'items-center gap-1',
            )}
          >
            <NavLinks items={main} />
            {plant.length > 0 ? <PlantMenu items={plant} /> : null}
          </nav>
          <div className="ml-auto flex items-center gap-3">
            <div
              className={clsx(
                'hidden text-right leading-tight whitespace-nowrap',
                items.length > 4 ? 'xl:block' : 'md:block',
              )}
            >
              <p className="text-sm font-medium">{me.user.name}</p>
              <p className="text-xs text-timber-100">
                {ROLE_LABELS[me.user.role]} · {who}
              </p>
            </div>
            <Button variant="inverse" size="sm" onClick={signOut} busy={logout.isPending}>
              Sign out
            </Button>
            <button
              type="button"
              className={clsx(
                'rounded p-2 text-white hover:bg-timber-700',
                inline === 'xl' ? 'xl:hidden' : 'lg:hidden',
                focusRing,
                'focus-visible:outline-white',
              )}
              aria-expanded={menuOpen}
              aria-controls="mobile-nav"
              onClick={() => setMenuOpen((open) => !open)}
            >
              <span className="sr-only">Menu</span>
              <svg viewBox="0 0 20 20" className="h-5 w-5" aria-hidden="true">
                <path
                  d="M3 5h14M3 10h14M3 15h14"
                  stroke="currentColor"
                  strokeWidth="1.8"
                  strokeLinecap="round"
                />
              </svg>
            </button>
          </div>
        </div>
        {menuOpen ? (
          <nav
            id="mobile-nav"
            aria-label="Main"
            className={clsx(
              'border-t border-timber-700 px-4 py-2',
              inline === 'xl' ? 'xl:hidden' : 'lg:hidden',
            )}
          >
            <NavLinks items={main} vertical onNavigate={() => setMenuOpen(false)} />
            {plant.length > 0 ? (
              <>
                <p className="px-3 pt-3 pb-1 text-xs font-semibold tracking-wide text-timber-100 uppercase">
                  Plant
                </p>
                <NavLinks items={plant} vertical onNavigate={() => setMenuOpen(false)} />
              </>
            ) : null}
            <p className="px-3 pt-2 pb-1 text-xs text-timber-100">
              {me.user.name} · {ROLE_LABELS[me.user.role]}
            </p>
          </nav>
        ) : null}
        <div
          aria-hidden="true"
          className={clsx(
            'h-0.5 bg-timber-400 transition-opacity',
            navigation.state === 'idle' ? 'opacity-0' : 'animate-pulse opacity-100',
          )}
        />
      </header>
      <main
        id="main"
        className="mx-auto w-full max-w-page flex-1 px-4 py-6 lg:px-6 lg:py-8 print:max-w-none print:p-0"
      >
        <Outlet />
      </main>
      <footer className="border-t border-sand-200 px-4 py-4 text-center text-xs text-sand-600 print:hidden">
        Spanwise · {me.plant.name}
        {me.plant.demo ? ' · demo plant (sample data)' : ''}
      </footer>
    </div>
  );
}
