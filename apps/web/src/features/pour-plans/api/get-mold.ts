import { useQuery } from '@tanstack/react-query';
import { moldQueryOptions } from '../../../lib/resources/molds';

/** A mould with its cavity report (the volume-vs-level curve the plan splits into layers), from the moulds' one cache entry. */
export function useMold(moldId: string | null) {
  return useQuery({ ...moldQueryOptions(moldId ?? ''), enabled: moldId !== null });
}
