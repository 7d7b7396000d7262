import { Pager } from '../../../components/ui/Pager';
import { paths } from '../../../config/paths';
import { pageCount, type PieceFilters } from '../utils/piece-filters';

export function PiecesPager({ filters, total }: { filters: PieceFilters; total: number }) {
  return (
    <Pager
      page={filters.page}
      pageCount={pageCount(total)}
      label="Pages of pieces"
      hrefFor={(page) => paths.pieces.getHref({ stage: filters.stage, q: filters.q, page })}
    />
  );
}
