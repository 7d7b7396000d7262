import { Link } from 'react-router';
import { paths } from '../../../config/paths';
import { cx } from '../../../lib/cx';
import type { ShelfTab } from '../utils/shelf-queries';

const tabs: readonly { tab: ShelfTab; label: string }[] = [
  { tab: 'resin-systems', label: 'Resin systems' },
  { tab: 'pigments', label: 'Pigments' },
  { tab: 'lots', label: 'Lots' },
];

/** The three parts of the shelf as links, so each can be bookmarked and the browser's back button works. */
export function ShelfTabs({ current }: { current: ShelfTab }) {
  return (
    <nav aria-label="Parts of the shelf" className="mb-6 border-b border-line">
      <ul className="-mb-px flex flex-wrap gap-1">
        {tabs.map(({ tab, label }) => {
          const active = tab === current;
          return (
            <li key={tab}>
              <Link
                to={paths.shelf.getHref({ tab })}
                aria-current={active ? 'page' : undefined}
                className={cx(
                  'inline-flex min-h-touch items-center rounded-t-lg border border-b-4 px-4 font-semibold',
                  active ? 'border-line border-b-resin-500 bg-white text-walnut-900' : 'border-transparent text-walnut-700 hover:bg-walnut-50',
                )}
              >
                {label}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
