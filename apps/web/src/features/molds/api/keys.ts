import type { Dam } from '../types';

export interface MoldListQuery {
  pieceId?: string;
  limit: number;
  offset: number;
}

export interface FillKey {
  /** Absolute level in the report frame, mm. */
  levelMm: number;
  dam: Dam;
  depthMap: boolean;
}

export interface LayersKey {
  levelsMm: readonly number[];
  dam: Dam;
}

// Fill, layers and the mould file sit under their mould's detail key, so forgetting a mould forgets them too.
export const moldKeys = {
  all: ['molds'] as const,
  lists: () => [...moldKeys.all, 'list'] as const,
  list: (query: MoldListQuery) => [...moldKeys.lists(), query] as const,
  details: () => [...moldKeys.all, 'detail'] as const,
  detail: (moldId: string) => [...moldKeys.details(), moldId] as const,
  fill: (moldId: string, key: FillKey) => [...moldKeys.detail(moldId), 'fill', key] as const,
  layers: (moldId: string, key: LayersKey) => [...moldKeys.detail(moldId), 'layers', key] as const,
  stl: (moldId: string) => [...moldKeys.detail(moldId), 'stl'] as const,
};
