import { Id } from '@gelpoint/contracts';

export const plansPerPage = 50;

export interface PlanListFilters {
  pieceId?: string;
  page: number;
}

export interface PlanListQuery {
  pieceId?: string;
  limit: number;
  offset: number;
}

export function readPlanListFilters(search: URLSearchParams): PlanListFilters {
  const filters: PlanListFilters = { page: 1 };
  const pieceId = Id.safeParse(search.get('pieceId'));
  if (pieceId.success) filters.pieceId = pieceId.data;
  const page = Number(search.get('page'));
  if (Number.isSafeInteger(page) && page > 1) filters.page = page;
  return filters;
}

export function planListQuery(filters: PlanListFilters): PlanListQuery {
  const query: PlanListQuery = { limit: plansPerPage, offset: (filters.page - 1) * plansPerPage };
  if (filters.pieceId) query.pieceId = filters.pieceId;
  return query;
}
