import { ButtonLink } from '../../../components/ui/ButtonLink';
import { paths } from '../../../config/paths';
import { boardPageCount, type CureBoardFilters } from '../utils/cure-board-filters';

export function CureBoardPager({ filters, total }: { filters: CureBoardFilters; total: number }) {
  const pages = boardPageCount(total);
  if (pages <= 1) return null;
  const link = (page: number) => paths.cureBoard.getHref({ status: filters.status, readyToday: filters.readyToday, page });
  return (
    <nav aria-label="Pages of the cure board" className="mt-6 flex flex-wrap items-center justify-between gap-3">
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
