import { Pager } from '../../../components/ui/Pager';
import { shelfPageCount } from '../utils/shelf-queries';

export interface ShelfPagerProps {
  page: number;
  total: number;
  /** What this page is a page of, e.g. "lots". */
  what: string;
  hrefFor: (page: number) => string;
}

export function ShelfPager({ page, total, what, hrefFor }: ShelfPagerProps) {
  return <Pager page={page} pageCount={shelfPageCount(total)} label={`Pages of ${what}`} hrefFor={hrefFor} />;
}
