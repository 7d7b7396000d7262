import { ButtonLink } from '../../../components/ui/ButtonLink';
import { paths } from '../../../config/paths';
import { pageCount, type PieceFilters } from '../utils/piece-filters';

export function PiecesPager({ filters, total }: { filters: PieceFilters; total: number }) {
  const pages = pageCount(total);
  if (pages <= 1) return null;
  const link = (page: number) => paths.pieces.getHref({ stage: filters.stage, q: filters.q, page });
  return (
    <nav aria-label="Pages of pieces" className="mt-6 flex flex-wrap items-center justify-between gap-3">
      {filters.page > 1 ? (
        <ButtonLink variant="secondary" to={link(filters.page - 1)}>
          Previous page
        </ButtonLink>
      ) : (
        <span />
      )}
      <p className="text-ink-soft">
        Page {filters.page} of {pages}
      </p>
      {filters.page < pages ? (
        <ButtonLink variant="secondary" to={link(filters.page + 1)}>
          Next page
        </ButtonLink>
      ) : (
        <span />
      )}
    </nav>
  );
}
