import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { Button } from '../../../../components/ui/Button';
import { DocumentTitle } from '../../../../components/ui/DocumentTitle';
import { ErrorAlert } from '../../../../components/ui/ErrorAlert';
import { PageSpinner } from '../../../../components/ui/PageSpinner';
import { TextLink } from '../../../../components/ui/TextLink';
import { paths } from '../../../../config/paths';
import { pieceQueryOptions, usePiece } from '../../../../features/pieces/api/get-piece';
import { ensurePieceRecord, usePieceRecord } from '../../../../features/pours/api/get-piece-record';
import { CureRecord } from '../../../../features/pours/components/CureRecord';
import { requireSession } from '../../../session-loaders';
import { readId } from '../pour-plans/read-id';
import { useShop } from '../../../../features/shop/api/get-shop';
import { shopQueryOptions } from '../../../../lib/resources/shop';

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireSession(queryClient, request);
    const pieceId = readId(params, 'pieceId', 'piece');
    await Promise.all([
      queryClient.ensureQueryData(pieceQueryOptions(pieceId)),
      ensurePieceRecord(queryClient, pieceId),
      queryClient.ensureQueryData(shopQueryOptions()),
    ]);
    return null;
  };

/** A page of its own, outside the app frame, so what prints is the record and nothing else. */
export function Component() {
  const pieceId = readId(useParams(), 'pieceId', 'piece');
  const piece = usePiece(pieceId);
  const record = usePieceRecord(pieceId);
  const shop = useShop();

  const body = () => {
    const failed = piece.error ?? record.error ?? shop.error;
    if (failed) return <ErrorAlert error={failed} />;
    if (!piece.data || !record.data || !shop.data) return <PageSpinner label="Loading the cure record…" />;
    return <CureRecord piece={piece.data} pours={record.data} shop={shop.data} />;
  };

  return (
    <div className="min-h-dvh bg-white text-ink print:min-h-0">
      <DocumentTitle title={piece.data ? `Cure record · ${piece.data.name}` : 'Cure record'} />
      <div className="mx-auto flex max-w-5xl flex-col gap-4 px-4 py-6 print:max-w-none print:p-0">
        <nav aria-label="Cure record" className="flex flex-wrap items-center justify-between gap-3 print:hidden">
          <TextLink to={paths.piece.getHref(pieceId)}>Back to the piece</TextLink>
          <Button onClick={() => window.print()}>Print</Button>
        </nav>
        <main>{body()}</main>
      </div>
    </div>
  );
}
