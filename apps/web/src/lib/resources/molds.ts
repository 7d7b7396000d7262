import type { CavityFill } from '@gelpoint/contracts';
import { keepPreviousData, queryOptions, type QueryClient } from '@tanstack/react-query';
import { callRoute } from '../api-routes';

// One cache entry per mould resource, whichever screen reads it (the moulds area, the planner): a change or a deletion
// then reaches every view of the mould through these keys.

type Dam = CavityFill['dam'];

export interface MoldListQuery {
  pieceId?: string;
  limit: number;
  offset: number;
}

export interface FillKey {
  /** Height of the resin surface above the cavity floor (with this dam), mm. */
  levelMm: number;
  dam: Dam;
  depthMap: boolean;
}

export interface LayersKey {
  /** Heights above the cavity floor (with this dam), mm, ascending. */
  levelsMm: readonly number[];
  dam: Dam;
}

// Fill, layers, the depth map and the mould file sit under their mould's detail key, so forgetting a mould forgets them too. Its
// analysis time is part of the fill, layer and depth map keys: a mould read again (new units or up axis) answers anew.
export const moldKeys = {
  all: ['molds'] as const,
  lists: () => [...moldKeys.all, 'list'] as const,
  list: (query: MoldListQuery) => [...moldKeys.lists(), query] as const,
  details: () => [...moldKeys.all, 'detail'] as const,
  detail: (moldId: string) => [...moldKeys.details(), moldId] as const,
  fill: (moldId: string, key: FillKey, analysedAt: string | null = null) => [...moldKeys.detail(moldId), 'fill', analysedAt, key] as const,
  layers: (moldId: string, key: LayersKey, analysedAt: string | null = null) => [...moldKeys.detail(moldId), 'layers', analysedAt, key] as const,
  stl: (moldId: string) => [...moldKeys.detail(moldId), 'stl'] as const,
  depthMap: (moldId: string, analysedAt: string | null = null) => [...moldKeys.detail(moldId), 'depth-map', analysedAt] as const,
};

const withSignal = (signal?: AbortSignal) => (signal ? { signal } : {});

export const getMold = (moldId: string, signal?: AbortSignal) => callRoute('getMold', { params: { id: moldId } }, withSignal(signal));

export const getMolds = (query: MoldListQuery, signal?: AbortSignal) => callRoute('listMolds', { query }, withSignal(signal));

export const getMoldFill = (moldId: string, key: FillKey, signal?: AbortSignal) =>
  callRoute(
    'moldFill',
    { params: { id: moldId }, query: { level: key.levelMm, from: 'floor', dam: key.dam, depthMap: key.depthMap ? 'true' : 'false' } },
    withSignal(signal),
  );

export const getMoldLayers = (moldId: string, key: LayersKey, signal?: AbortSignal) =>
  callRoute('moldLayers', { params: { id: moldId }, query: { levels: key.levelsMm.join(','), from: 'floor', dam: key.dam } }, withSignal(signal));

/** A mould: its analysis status and, once ready, its cavity report. */
export const moldQueryOptions = (moldId: string) =>
  queryOptions({
    queryKey: moldKeys.detail(moldId),
    queryFn: ({ signal }) => getMold(moldId, signal),
  });

/** A page of the shop's moulds (or one piece's). */
export const moldListQueryOptions = (query: MoldListQuery) =>
  queryOptions({
    queryKey: moldKeys.list(query),
    queryFn: ({ signal }) => getMolds(query, signal),
  });

/** The fill at one level: an analysis never changes, so neither does its answer (the analysis time is in the key). */
export const moldFillQueryOptions = (moldId: string, key: FillKey, analysedAt: string | null) =>
  queryOptions({
    queryKey: moldKeys.fill(moldId, key, analysedAt),
    queryFn: ({ signal }) => getMoldFill(moldId, key, signal),
    placeholderData: keepPreviousData,
    staleTime: Number.POSITIVE_INFINITY,
  });

/** The resin between consecutive heights above the cavity floor. */
export const moldLayersQueryOptions = (moldId: string, key: LayersKey, analysedAt: string | null) =>
  queryOptions({
    queryKey: moldKeys.layers(moldId, key, analysedAt),
    queryFn: ({ signal }) => getMoldLayers(moldId, key, signal),
    placeholderData: keepPreviousData,
    staleTime: Number.POSITIVE_INFINITY,
  });

/** After a deletion: the mould's own entries go (no page may show it again) and every list is asked again. */
export async function forgetMold(queryClient: QueryClient, moldId: string): Promise<void> {
  queryClient.removeQueries({ queryKey: moldKeys.detail(moldId) });
  await queryClient.invalidateQueries({ queryKey: moldKeys.lists() });
}
