import { PieceStage } from '@gelpoint/contracts';

export const piecesPerPage = 25;
const maxSearchLength = 120;

export interface PieceFilters {
  stage?: PieceStage;
  q?: string;
  page: number;
}

/** Reads the list's filters from the address bar, dropping what the API would refuse rather than failing the page. */
export function readPieceFilters(search: URLSearchParams): PieceFilters {
  const filters: PieceFilters = { page: 1 };
  const stage = PieceStage.safeParse(search.get('stage'));
  if (stage.success) filters.stage = stage.data;
  const q = (search.get('q') ?? '').trim().slice(0, maxSearchLength);
  if (q) filters.q = q;
  const page = Number(search.get('page'));
  if (Number.isSafeInteger(page) && page > 1) filters.page = page;
  return filters;
}

export interface PieceListQuery {
  stage?: PieceStage;
  q?: string;
  limit: number;
  offset: number;
}

export function pieceListQuery(filters: PieceFilters): PieceListQuery {
  const query: PieceListQuery = { limit: piecesPerPage, offset: (filters.page - 1) * piecesPerPage };
  if (filters.stage) query.stage = filters.stage;
  if (filters.q) query.q = filters.q;
  return query;
}

export function pageCount(total: number, perPage: number = piecesPerPage): number {
  return Math.max(1, Math.ceil(total / perPage));
}
