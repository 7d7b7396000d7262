import { PourListQuery } from '@gelpoint/contracts';
import type { z } from 'zod';

export const poursPerPage = 50;

export type BoardStatus = z.output<typeof PourListQuery>['status'];
export const boardStatuses: readonly BoardStatus[] = ['active', 'released', 'machined', 'all'];

export interface CureBoardFilters {
  status: BoardStatus;
  readyToday: boolean;
  page: number;
}

export interface CureBoardQuery {
  status: BoardStatus;
  readyToday: 'true' | 'false';
  limit: number;
  offset: number;
}

/** Reads the board's filters from the address bar, falling back to the defaults rather than failing the page. */
export function readCureBoardFilters(search: URLSearchParams): CureBoardFilters {
  const status = boardStatuses.find((s) => s === search.get('status')) ?? 'active';
  const page = Number(search.get('page'));
  return { status, readyToday: search.get('readyToday') === 'true', page: Number.isSafeInteger(page) && page > 1 ? page : 1 };
}

export function cureBoardQuery(filters: CureBoardFilters): CureBoardQuery {
  return { status: filters.status, readyToday: filters.readyToday ? 'true' : 'false', limit: poursPerPage, offset: (filters.page - 1) * poursPerPage };
}

export function boardPageCount(total: number): number {
  return Math.max(1, Math.ceil(total / poursPerPage));
}

export const boardStatusLabels: Record<BoardStatus, string> = {
  active: 'Curing now',
  released: 'Released for machining',
  machined: 'Machined',
  all: 'Every pour',
};
