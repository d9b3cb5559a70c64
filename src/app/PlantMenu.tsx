import clsx from 'clsx';
import { useEffect, useId, useRef, useState } from 'react';
import { NavLink, useLocation } from 'react-router';
import { focusRing } from '../components/ui';
import type { NavItem } from './navigation';

/**
 * The plant manager's settings (users, price book, production, stock, inbox) behind one button, so
 * the main bar stays one line on a laptop. Closes on a choice, Escape, or a click elsewhere.
 */
export function PlantMenu({ items }: { items: NavItem[] }) {
  const [open, setOpen] = useState(false);
  const box = useRef<HTMLDivElement>(null);
  const id = useId();
  const { pathname } = useLocation();
  const active = items.some((item) => pathname.startsWith(item.to));

  useEffect(() => {
    if (!open) return;
    const away = (event: MouseEvent) => {
      if (!box.current?.contains(event.target as Node)) setOpen(false);
    };
    const escape = (event: KeyboardEvent) => {
      if (event.key === 'Escape') setOpen(false);
    };
    document.addEventListener('mousedown', away);
    document.addEventListener('keydown', escape);
    return () => {
      document.removeEventListener('mousedown', away);
      document.removeEventListener('keydown', escape);
    };
  }, [open]);

  return (
    <div ref={box} className="relative">
      <button
        type="button"
        aria-expanded={open}
        aria-controls={id}
        onClick={() => setOpen((was) => !was)}
        className={clsx(
          'flex items-center gap-1 rounded px-3 py-2 text-sm font-medium whitespace-nowrap transition-colors',
          active ? 'bg-timber-700 text-white' : 'text-timber-50 hover:bg-timber-700/60',
          focusRing,
          'focus-visible:outline-white',
        )}
      >
        Plant
        <svg viewBox="0 0 12 12" className="h-3 w-3" aria-hidden="true">
          <path d="M2 4l4 4 4-4" stroke="currentColor" strokeWidth="1.6" fill="none" />
        </svg>
      </button>
      {open ? (
        <ul
          id={id}
          className="absolute right-0 z-40 mt-1 w-48 rounded-md border border-sand-200 bg-white py-1 text-sand-900 shadow-lg"
        >
          {items.map((item) => (
            <li key={item.to}>
              <NavLink
                to={item.to}
                onClick={() => setOpen(false)}
                className={({ isActive }) =>
                  clsx(
                    'block px-4 py-2 text-sm hover:bg-sand-100',
                    isActive && 'font-semibold text-timber-800',
                    focusRing,
                  )
                }
              >
                {item.label}
              </NavLink>
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
