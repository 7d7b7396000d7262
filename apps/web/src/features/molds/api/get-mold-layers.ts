import { useQuery } from '@tanstack/react-query';
import { moldLayersQueryOptions, type LayersKey } from '../../../lib/resources/molds';

export function useMoldLayers(moldId: string, key: LayersKey | null, analysedAt: string | null) {
  return useQuery({
    ...moldLayersQueryOptions(moldId, key ?? { levelsMm: [], dam: 'outline' }, analysedAt),
    enabled: key !== null && key.levelsMm.length >= 2,
  });
}
