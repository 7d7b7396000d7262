import type { QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Card } from '../../../../components/ui/Card';
import { ErrorAlert } from '../../../../components/ui/ErrorAlert';
import { Spinner } from '../../../../components/ui/Spinner';
import { moldsQueryOptions, useMolds } from '../../../../features/molds/api/get-molds';
import { PieceMoldsList } from '../../../../features/molds/components/PieceMoldsList';
import { pourPlansQueryOptions, usePourPlans } from '../../../../features/pour-plans/api/get-pour-plans';
import { PiecePlansList } from '../../../../features/pour-plans/components/PiecePlansList';
import { usePiecePours } from '../../../../features/pours/api/get-piece-pours';
import { PiecePoursList } from '../../../../features/pours/components/PiecePoursList';
import { useShop } from '../../../../features/shop/api/get-shop';
import { piecePoursQueryOptions } from '../../../../lib/resources/pours';

// A piece has a handful of each; the lists' own limit is far above that.
const pieceQuery = (pieceId: string) => ({ pieceId, limit: 200, offset: 0 });

/** Starts the three lists with the piece, so its page draws them without a second wait. */
export function prefetchPieceWork(queryClient: QueryClient, pieceId: string): void {
  void queryClient.prefetchQuery(moldsQueryOptions(pieceQuery(pieceId)));
  void queryClient.prefetchQuery(pourPlansQueryOptions(pieceQuery(pieceId)));
  void queryClient.prefetchQuery(piecePoursQueryOptions(pieceId));
}

interface ListQuery<T> {
  data: T | undefined;
  isError: boolean;
  error: unknown;
}

function ListState<T>({ query, empty, children }: { query: ListQuery<T>; empty: (data: T) => boolean; children: (data: T) => ReactNode }) {
  if (query.isError) return <ErrorAlert error={query.error} live="none" />;
  if (!query.data) return <Spinner label="Loading…" />;
  return <>{empty(query.data) ? null : children(query.data)}</>;
}

/** What the piece is made with: its moulds, its pour plans and its pours, each linked, with its state. */
export function PieceWork({ pieceId }: { pieceId: string }) {
  const molds = useMolds(pieceQuery(pieceId));
  const plans = usePourPlans(pieceQuery(pieceId));
  const pours = usePiecePours(pieceId);
  const shop = useShop();
  const unitSystem = shop.data?.unitSystem ?? 'metric';
  const moldNames = new Map((molds.data?.items ?? []).map((m) => [m.id, m.name] as const));

  return (
    <div className="mt-6 grid gap-6 xl:grid-cols-3">
      <Card title="Moulds">
        <ListState query={molds} empty={(d) => d.items.length === 0}>
          {(d) => <PieceMoldsList molds={d.items} unitSystem={unitSystem} />}
        </ListState>
        {molds.data?.items.length === 0 ? (
          <p className="text-ink-soft">No mould yet: upload its STL (“Upload its mould” above), or plan with a quick shape.</p>
        ) : null}
      </Card>
      <Card title="Pour plans">
        <ListState query={plans} empty={(d) => d.items.length === 0}>
          {(d) => <PiecePlansList plans={d.items} moldNames={moldNames} unitSystem={unitSystem} />}
        </ListState>
        {plans.data?.items.length === 0 ? <p className="text-ink-soft">No pour plan yet.</p> : null}
      </Card>
      <Card title="Pours">
        <ListState query={pours} empty={(d) => d.items.length === 0}>
          {(d) => <PiecePoursList pours={d.items} />}
        </ListState>
        {pours.data?.items.length === 0 ? <p className="text-ink-soft">Nothing poured yet: a pour starts from its plan (“Start the pour”).</p> : null}
      </Card>
    </div>
  );
}
