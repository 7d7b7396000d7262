import type { UnitSystem } from '@gelpoint/core';
import type { ReactNode } from 'react';
import { useNavigate } from 'react-router';
import { ButtonLink } from '../../../components/ui/ButtonLink';
import { EmptyState } from '../../../components/ui/EmptyState';
import { QueryResult } from '../../../components/ui/QueryResult';
import { paths } from '../../../config/paths';
import { useLots } from '../api/get-lots';
import { usePigments } from '../api/get-pigments';
import { useResinSystems } from '../api/get-resin-systems';
import { lotListQuery, pigmentListQuery, resinSystemListQuery, shelfLinkOf, type ShelfFilters } from '../utils/shelf-queries';
import { nextSort } from '../utils/table-sort';
import { LotsTable } from './LotsTable';
import { PigmentsTable } from './PigmentsTable';
import { ResinSystemsTable } from './ResinSystemsTable';
import { ShelfPager } from './ShelfPager';

export interface ShelfSectionProps {
  filters: ShelfFilters;
  unitSystem: UnitSystem;
  /** The shop's ISO 4217 code, for prices. */
  currency: string;
  mayKeep: boolean;
}

function useSortAndPages(filters: ShelfFilters) {
  const navigate = useNavigate();
  const link = shelfLinkOf(filters);
  return {
    // The server sorts the whole shelf, so a new order starts again from its first page.
    onSort: (key: string) => {
      const sort = nextSort(filters.sort, key);
      void navigate(paths.shelf.getHref({ ...link, page: 1, sort: sort.key, dir: sort.direction }), { replace: true, preventScrollReset: true });
    },
    hrefFor: (page: number) => paths.shelf.getHref({ ...link, page }),
  };
}

function Count({ total, one, many, filtered }: { total: number; one: string; many: string; filtered: boolean }) {
  return (
    <p role="status" className="mb-3 text-ink-soft">
      {total === 1 ? `1 ${one}` : `${total} ${many}`}
      {filtered ? ' match' : ''}
    </p>
  );
}

function Empty({
  filtered,
  title,
  addHref,
  addLabel,
  mayKeep,
  children,
}: {
  filtered: boolean;
  title: string;
  addHref: string;
  addLabel: string;
  mayKeep: boolean;
  children: ReactNode;
}) {
  return filtered ? (
    <EmptyState headingLevel={2} title="Nothing matches">
      Try fewer words or another filter.
    </EmptyState>
  ) : (
    <EmptyState headingLevel={2} title={title} actions={mayKeep ? <ButtonLink to={addHref}>{addLabel}</ButtonLink> : null}>
      {children}
    </EmptyState>
  );
}

export function ResinSystemsSection({ filters, unitSystem, currency, mayKeep }: ShelfSectionProps) {
  const list = useResinSystems(resinSystemListQuery(filters));
  const { onSort, hrefFor } = useSortAndPages(filters);
  const filtered = Boolean(filters.q || filters.includeArchived);
  return (
    <QueryResult query={list} loadingLabel="Loading resin systems…">
      {(page) =>
        page.items.length === 0 ? (
          <Empty
            filtered={filtered}
            title="No resin systems yet"
            addHref={paths.newResinSystem.getHref()}
            addLabel="Add the first resin system"
            mayKeep={mayKeep}
          >
            A resin system is one product from its data sheet: mix ratio, densities, times, and the layer and batch limits.
          </Empty>
        ) : (
          <>
            <Count total={page.total} one="resin system" many="resin systems" filtered={filtered} />
            <ResinSystemsTable resinSystems={page.items} unitSystem={unitSystem} currency={currency} sort={filters.sort} onSort={onSort} />
            <ShelfPager page={filters.page} total={page.total} what="resin systems" hrefFor={hrefFor} />
          </>
        )
      }
    </QueryResult>
  );
}

export function PigmentsSection({ filters, unitSystem, currency, mayKeep }: ShelfSectionProps) {
  const list = usePigments(pigmentListQuery(filters));
  const { onSort, hrefFor } = useSortAndPages(filters);
  const filtered = Boolean(filters.q || filters.includeArchived);
  return (
    <QueryResult query={list} loadingLabel="Loading pigments…">
      {(page) =>
        page.items.length === 0 ? (
          <Empty filtered={filtered} title="No pigments yet" addHref={paths.newPigment.getHref()} addLabel="Add the first pigment" mayKeep={mayKeep}>
            Pigments are weighed as a percentage of part A + part B by mass, never above their own maximum.
          </Empty>
        ) : (
          <>
            <Count total={page.total} one="pigment" many="pigments" filtered={filtered} />
            <PigmentsTable pigments={page.items} unitSystem={unitSystem} currency={currency} sort={filters.sort} onSort={onSort} />
            <ShelfPager page={filters.page} total={page.total} what="pigments" hrefFor={hrefFor} />
          </>
        )
      }
    </QueryResult>
  );
}

export function LotsSection({ filters, unitSystem, mayKeep }: ShelfSectionProps) {
  const list = useLots(lotListQuery(filters));
  const { onSort, hrefFor } = useSortAndPages(filters);
  const filtered = Boolean(filters.q || filters.status || filters.part);
  return (
    <QueryResult query={list} loadingLabel="Loading lots…">
      {(page) =>
        page.items.length === 0 ? (
          <Empty filtered={filtered} title="No lots yet" addHref={paths.newLot.getHref()} addLabel="Receive the first lot" mayKeep={mayKeep}>
            Each container of part A, part B or pigment that comes in is a lot; batches record which lots they were mixed from.
          </Empty>
        ) : (
          <>
            <Count total={page.total} one="lot" many="lots" filtered={filtered} />
            <LotsTable lots={page.items} unitSystem={unitSystem} sort={filters.sort} onSort={onSort} />
            <ShelfPager page={filters.page} total={page.total} what="lots" hrefFor={hrefFor} />
          </>
        )
      }
    </QueryResult>
  );
}
