import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { pieceQueryOptions } from '../../../../features/pieces/api/get-piece';
import { pourPlanQueryOptions } from '../../../../lib/resources/pour-plans';
import { requireSession } from '../../../session-loaders';
import { readId } from './read-id';
import { shopQueryOptions } from '../../../../lib/resources/shop';

/** A saved plan's pages (the plan and its run sheet) need the plan, its piece and the shop's units. */
export const createPlanPageLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireSession(queryClient, request);
    const planId = readId(params, 'planId', 'pour plan');
    const [plan] = await Promise.all([queryClient.ensureQueryData(pourPlanQueryOptions(planId)), queryClient.ensureQueryData(shopQueryOptions())]);
    await queryClient.ensureQueryData(pieceQueryOptions(plan.pieceId));
    return null;
  };
