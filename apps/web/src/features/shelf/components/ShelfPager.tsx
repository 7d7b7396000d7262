import { ButtonLink } from '../../../components/ui/ButtonLink';
import { shelfPageCount } from '../utils/shelf-queries';

export interface ShelfPagerProps {
  page: number;
  total: number;
  /** What this page is a page of, e.g. "lots". */
  what: string;
  hrefFor: (page: number) => string;
}

export function ShelfPager({ page, total, what, hrefFor }: ShelfPagerProps) {
  const pages = shelfPageCount(total);
  if (pages <= 1) return null;
  return (
    <nav aria-label={`Pages of ${what}`} className="mt-6 flex flex-wrap items-center justify-between gap-3">
      {page > 1 ? (
        <ButtonLink variant="secondary" to={hrefFor(page - 1)}>
          Previous page
        </ButtonLink>
      ) : (
        <span />
      )}
      <p className="text-ink-soft">
        Page {page} of {pages}
      </p>
      {page < pages ? (
        <ButtonLink variant="secondary" to={hrefFor(page + 1)}>
          Next page
        </ButtonLink>
      ) : (
        <span />
      )}
    </nav>
  );
}
