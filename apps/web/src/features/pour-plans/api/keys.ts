import type { PlanListQuery } from '../utils/plan-list-filters';

// The mould lookups the planner makes live under the pour plans, apart from the moulds area's own cache.
export const pourPlanKeys = {
  all: ['pour-plans'] as const,
  lists: () => [...pourPlanKeys.all, 'list'] as const,
  list: (query: PlanListQuery) => [...pourPlanKeys.lists(), query] as const,
  details: () => [...pourPlanKeys.all, 'detail'] as const,
  detail: (planId: string) => [...pourPlanKeys.details(), planId] as const,
  cavities: () => [...pourPlanKeys.all, 'cavity'] as const,
  pieceMolds: (pieceId: string) => [...pourPlanKeys.cavities(), 'piece-molds', pieceId] as const,
  mold: (moldId: string) => [...pourPlanKeys.cavities(), 'mold', moldId] as const,
  moldFill: (moldId: string, levelMm: number, dam: 'outline' | 'box') => [...pourPlanKeys.cavities(), 'fill', moldId, levelMm, dam] as const,
  moldLayers: (moldId: string, fromMm: number, toMm: number, dam: 'outline' | 'box') => [...pourPlanKeys.cavities(), 'layers', moldId, fromMm, toMm, dam] as const,
};
