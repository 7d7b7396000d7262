import { can } from '@gelpoint/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { Alert } from '../../../../components/ui/Alert';
import { Card } from '../../../../components/ui/Card';
import { DocumentTitle } from '../../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../../components/ui/PageHeader';
import { TextLink } from '../../../../components/ui/TextLink';
import { paths } from '../../../../config/paths';
import { UploadMoldForm } from '../../../../features/molds/components/UploadMoldForm';
import { piecesQueryOptions, usePieces } from '../../../../features/pieces/api/get-pieces';
import { roleLabel } from '../../../../lib/roles';
import { requireSession } from '../../../session-loaders';
import { useSignedInSession } from '../../../signed-in-session';
import { useShop } from '../../../../features/shop/api/get-shop';
import { shopQueryOptions } from '../../../../lib/resources/shop';

const piecesToChooseFrom = { limit: 200, offset: 0 };

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireSession(queryClient, request);
    await Promise.all([queryClient.ensureQueryData(shopQueryOptions()), queryClient.ensureQueryData(piecesQueryOptions(piecesToChooseFrom))]);
    return null;
  };

export function Component() {
  const session = useSignedInSession();
  const navigate = useNavigate();
  const [search] = useSearchParams();
  const shop = useShop();
  const pieces = usePieces(piecesToChooseFrom);
  const pieceId = search.get('pieceId') ?? undefined;

  return (
    <>
      <DocumentTitle title="Upload a mould" />
      <PageHeader
        eyebrow="Moulds"
        title="Upload a mould"
        description="Send the mould file (STL, 3MF or OBJ); Gelpoint measures the cavity and writes its report."
      />
      {can(session.role, 'mold:change') ? (
        <Card className="max-w-2xl">
          <UploadMoldForm
            pieces={pieces.data?.items ?? []}
            {...(pieceId ? { defaultPieceId: pieceId } : {})}
            unitSystem={shop.data?.unitSystem ?? 'metric'}
            onUploaded={(mold) => navigate(paths.mould.getHref(mold.id), { replace: true })}
          />
        </Card>
      ) : (
        <Alert tone="warning" title="Your role can't upload moulds" live="none">
          You are signed in as {roleLabel(session.role).toLowerCase()}. Makers and the shop lead upload moulds; you can read every report.
        </Alert>
      )}
      <p className="mt-6">
        <TextLink to={paths.moulds.getHref()}>Back to all moulds</TextLink>
      </p>
    </>
  );
}
