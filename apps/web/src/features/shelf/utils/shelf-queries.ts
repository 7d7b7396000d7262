import { LotPart as LotPartSchema, LotSort, PigmentSort, ResinSystemSort, type SortDirection } from '@gelpoint/contracts';
import type { z } from 'zod';
import type { ShelfLink } from '../../../config/paths';
import type { LotPart } from './shelf-words';
import { readSortParam, type SortState } from './table-sort';

export const shelfTabs = ['resin-systems', 'pigments', 'lots'] as const;
export type ShelfTab = (typeof shelfTabs)[number];

export const lotStatuses = ['in_stock', 'low', 'expired'] as const;
export type LotStatusFilter = (typeof lotStatuses)[number];

/** The shelf may hold a thousand lots: the API pages them, fifty at a time. */
export const shelfRowsPerPage = 50;
const maxSearchLength = 120;

export interface ShelfFilters {
  tab: ShelfTab;
  q?: string;
  page: number;
  sort?: SortState;
  includeArchived?: true;
  status?: LotStatusFilter;
  part?: LotPart;
}

/** A column to sort by, as the API names it; the whole list is sorted on the server, then paged. */
interface ServerSort<Sort extends string> {
  sort?: Sort;
  dir?: SortDirection;
}

interface CatalogueListQuery<Sort extends string> extends ServerSort<Sort> {
  q?: string;
  includeArchived?: 'true';
  limit: number;
  offset: number;
}

export type ResinSystemListQuery = CatalogueListQuery<ResinSystemSort>;
export type PigmentListQuery = CatalogueListQuery<PigmentSort>;

export interface LotListQuery extends ServerSort<LotSort> {
  q?: string;
  part?: LotPart;
  status?: LotStatusFilter;
  limit: number;
  offset: number;
}

// The columns each tab's table sorts by, from the contracts, so a header never asks for one the API refuses.
const sortColumns = { 'resin-systems': ResinSystemSort, pigments: PigmentSort, lots: LotSort } as const;

const isTab = (value: string | null): value is ShelfTab => (shelfTabs as readonly (string | null)[]).includes(value);
const isStatus = (value: string | null): value is LotStatusFilter => (lotStatuses as readonly (string | null)[]).includes(value);

/** Reads the shelf's tab, search, page and sort from the address, dropping what the API would refuse. */
export function readShelfFilters(search: URLSearchParams): ShelfFilters {
  const tab = search.get('tab');
  const filters: ShelfFilters = { tab: isTab(tab) ? tab : 'resin-systems', page: 1 };
  const q = (search.get('q') ?? '').trim().slice(0, maxSearchLength);
  if (q) filters.q = q;
  const page = Number(search.get('page'));
  if (Number.isSafeInteger(page) && page > 1) filters.page = page;
  const sort = readSortParam(search.get('sort'), search.get('dir'));
  if (sort && sortColumns[filters.tab].safeParse(sort.key).success) filters.sort = sort;
  if (filters.tab !== 'lots' && search.get('archived') === 'true') filters.includeArchived = true;
  if (filters.tab === 'lots') {
    const status = search.get('status');
    if (isStatus(status)) filters.status = status;
    const part = LotPartSchema.safeParse(search.get('part'));
    if (part.success) filters.part = part.data;
  }
  return filters;
}

function pageWindow(page: number) {
  return { limit: shelfRowsPerPage, offset: (page - 1) * shelfRowsPerPage };
}

function serverSort<Sort extends string>(columns: z.ZodType<Sort>, sort: SortState | undefined): ServerSort<Sort> {
  if (!sort) return {};
  const column = columns.safeParse(sort.key);
  return column.success ? { sort: column.data, dir: sort.direction === 'descending' ? 'desc' : 'asc' } : {};
}

function catalogueListQuery<Sort extends string>(filters: ShelfFilters, sort: ServerSort<Sort>): CatalogueListQuery<Sort> {
  const query: CatalogueListQuery<Sort> = { ...pageWindow(filters.page), ...sort };
  if (filters.q) query.q = filters.q;
  if (filters.includeArchived) query.includeArchived = 'true';
  return query;
}

export function resinSystemListQuery(filters: ShelfFilters): ResinSystemListQuery {
  return catalogueListQuery(filters, serverSort(ResinSystemSort, filters.sort));
}

export function pigmentListQuery(filters: ShelfFilters): PigmentListQuery {
  return catalogueListQuery(filters, serverSort(PigmentSort, filters.sort));
}

export function lotListQuery(filters: ShelfFilters): LotListQuery {
  const query: LotListQuery = { ...pageWindow(filters.page), ...serverSort(LotSort, filters.sort) };
  if (filters.q) query.q = filters.q;
  if (filters.part) query.part = filters.part;
  if (filters.status) query.status = filters.status;
  return query;
}

export function shelfPageCount(total: number): number {
  return Math.max(1, Math.ceil(total / shelfRowsPerPage));
}

/** Everything on the shelf, for pickers (the API's largest page). */
export const wholeShelfQuery: CatalogueListQuery<never> = { includeArchived: 'true', limit: 500, offset: 0 };

/** The link back to these very filters, for the pager and the sort headers. */
export function shelfLinkOf(filters: ShelfFilters): ShelfLink {
  const link: ShelfLink = { tab: filters.tab, page: filters.page };
  if (filters.q) link.q = filters.q;
  if (filters.sort) {
    link.sort = filters.sort.key;
    link.dir = filters.sort.direction;
  }
  if (filters.includeArchived) link.archived = true;
  if (filters.status) link.status = filters.status;
  if (filters.part) link.part = filters.part;
  return link;
}
