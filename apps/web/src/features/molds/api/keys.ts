import type { Dam } from '../types';

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
