import { useEffect, useId, useRef, useState, type ReactNode } from 'react';
import { Link, NavLink, useLocation } from 'react-router';
import { paths } from '../../config/paths';
import { cx } from '../../lib/cx';
import { Wordmark } from '../brand/Wordmark';
import { CloseIcon, MenuIcon } from '../ui/icons';

export interface FrameNavEntry {
  href: string;
  label: string;
  icon: ReactNode;
}

export interface AppFrameProps {
  navigation: readonly FrameNavEntry[];
  /** The current shop, with its switcher when the person belongs to several. */
  shopArea: ReactNode;
  /** Who is signed in, their role and the sign-out button. */
  account: ReactNode;
  /** True while the next page loads. */
  busy?: boolean;
  children: ReactNode;
}

export function AppFrame({ navigation, shopArea, account, busy = false, children }: AppFrameProps) {
  const [menuOpen, setMenuOpen] = useState(false);
  const navId = useId();
  const mainRef = useRef<HTMLElement>(null);
  const location = useLocation();
  const firstRender = useRef(true);

  // After moving to another page, start reading and tabbing from the new content, as a full page load would.
  useEffect(() => {
    setMenuOpen(false);
    if (firstRender.current) {
      firstRender.current = false;
      return;
    }
    mainRef.current?.focus();
  }, [location.pathname]);

  useEffect(() => {
    if (!menuOpen) return;
    const onKey = (event: KeyboardEvent) => {
      if (event.key === 'Escape') setMenuOpen(false);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [menuOpen]);

  return (
    <div className="min-h-dvh bg-paper">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:fixed focus:top-2 focus:left-2 focus:z-50 focus:rounded-lg focus:bg-walnut-900 focus:px-4 focus:py-3 focus:text-paper"
      >
        Skip to the page
      </a>
      <div
        aria-hidden="true"
        className={cx('fixed inset-x-0 top-0 z-40 h-1 bg-resin-400 transition-opacity', busy ? 'animate-pulse opacity-100' : 'opacity-0')}
      />

      <header className="border-b border-walnut-900 bg-walnut-800 text-paper">
        <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-4 gap-y-2 px-4 py-2">
          <Link to={paths.today.getHref()} className="order-1 inline-flex min-h-touch items-center rounded-lg">
            <Wordmark tone="light" />
            <span className="sr-only">, go to Today</span>
          </Link>
          <button
            type="button"
            className="order-2 ml-auto inline-flex min-h-touch min-w-touch items-center justify-center gap-2 rounded-lg border border-walnut-500 px-3 font-semibold md:hidden"
            aria-expanded={menuOpen}
            aria-controls={navId}
            onClick={() => setMenuOpen((open) => !open)}
          >
            {menuOpen ? <CloseIcon /> : <MenuIcon />}
            <span>Menu</span>
          </button>
          <div className="order-3 w-full md:order-2 md:w-auto">{shopArea}</div>
          <div className="order-4 w-full md:ml-auto md:w-auto">{account}</div>
        </div>
      </header>

      <div className="mx-auto max-w-7xl md:grid md:grid-cols-[15rem_minmax(0,1fr)] md:gap-6 md:px-4">
        <nav
          id={navId}
          aria-label="Main"
          className={cx('border-b border-line bg-paper-deep md:block md:border-0 md:bg-transparent md:py-6', menuOpen ? 'block' : 'hidden')}
        >
          <ul className="flex flex-col gap-1 p-2 md:sticky md:top-4 md:p-0">
            {navigation.map((entry) => (
              <li key={entry.href}>
                <NavLink
                  to={entry.href}
                  className={({ isActive }) =>
                    cx(
                      'flex min-h-touch items-center gap-3 rounded-lg border-l-4 px-3 py-2 font-semibold',
                      isActive
                        ? 'border-resin-500 bg-walnut-100 text-walnut-900'
                        : 'border-transparent text-walnut-700 hover:bg-walnut-50 hover:text-walnut-900',
                    )
                  }
                >
                  {entry.icon}
                  <span>{entry.label}</span>
                </NavLink>
              </li>
            ))}
          </ul>
        </nav>

        <main id="main" ref={mainRef} tabIndex={-1} aria-busy={busy || undefined} className="min-w-0 px-4 py-6 outline-none md:px-0">
          {children}
        </main>
      </div>
    </div>
  );
}
