import { can } from '@gelpoint/contracts';
import { useNavigate } from 'react-router';
import { Alert } from '../../../../components/ui/Alert';
import { Card } from '../../../../components/ui/Card';
import { DocumentTitle } from '../../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../../components/ui/PageHeader';
import { TextLink } from '../../../../components/ui/TextLink';
import { paths } from '../../../../config/paths';
import { useCreatePiece } from '../../../../features/pieces/api/create-piece';
import { PieceForm } from '../../../../features/pieces/components/PieceForm';
import { roleLabel } from '../../../../lib/roles';
import { useSignedInSession } from '../../../signed-in-session';

export function Component() {
  const session = useSignedInSession();
  const navigate = useNavigate();
  const create = useCreatePiece({ onSuccess: (piece) => navigate(paths.piece.getHref(piece.id), { replace: true }) });

  return (
    <>
      <DocumentTitle title="New piece" />
      <PageHeader title="New piece" description="Name it now; moulds and pour plans attach to it later." />
      {can(session.role, 'piece:create') ? (
        <Card className="max-w-2xl">
          <PieceForm submitLabel="Create piece" busyLabel="Creating…" busy={create.isPending} save={(values) => create.mutateAsync(values)} />
        </Card>
      ) : (
        <Alert tone="warning" title="Your role can't add pieces" live="none">
          You are signed in as {roleLabel(session.role).toLowerCase()}. Makers and the shop lead add pieces.
        </Alert>
      )}
      <p className="mt-6">
        <TextLink to={paths.pieces.getHref()}>Back to all pieces</TextLink>
      </p>
    </>
  );
}
