import { ButtonLink } from './ButtonLink';

export interface PagerProps {
  /** The page shown now, counted from 1. */
  page: number;
  pageCount: number;
  /** The accessible name of the pager, e.g. "Pages of pieces". */
  label: string;
  hrefFor: (page: number) => string;
}

/** Previous/next links around "Page n of m"; nothing when everything fits on one page. */
export function Pager({ page, pageCount, label, hrefFor }: PagerProps) {
  if (pageCount <= 1) return null;
  return (
    <nav aria-label={label} className="mt-6 flex flex-wrap items-center justify-between gap-3">
      {page > 1 ? (
        <ButtonLink variant="secondary" to={hrefFor(page - 1)}>
          Previous page
        </ButtonLink>
      ) : (
        <span />
      )}
      <p className="text-ink-soft">
        Page {page} of {pageCount}
      </p>
      {page < pageCount ? (
        <ButtonLink variant="secondary" to={hrefFor(page + 1)}>
          Next page
        </ButtonLink>
      ) : (
        <span />
      )}
    </nav>
  );
}
