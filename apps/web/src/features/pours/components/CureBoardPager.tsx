import { Pager } from '../../../components/ui/Pager';
import { paths } from '../../../config/paths';
import { boardPageCount, type CureBoardFilters } from '../utils/cure-board-filters';

export function CureBoardPager({ filters, total }: { filters: CureBoardFilters; total: number }) {
  return (
    <Pager
      page={filters.page}
      pageCount={boardPageCount(total)}
      label="Pages of the cure board"
      hrefFor={(page) => paths.cureBoard.getHref({ status: filters.status, readyToday: filters.readyToday, page })}
    />
  );
}
