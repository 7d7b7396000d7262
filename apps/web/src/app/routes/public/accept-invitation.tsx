import { InvitationTokenParams } from '@gelpoint/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { useLoaderData, type LoaderFunctionArgs } from 'react-router';
import { Alert } from '../../../components/ui/Alert';
import { DateTime } from '../../../components/ui/DateTime';
import { QueryResult } from '../../../components/ui/QueryResult';
import { TextLink } from '../../../components/ui/TextLink';
import { landingPath, paths } from '../../../config/paths';
import { invitationQueryOptions, useInvitation } from '../../../features/auth/api/get-invitation';
import { AcceptInvitationForm } from '../../../features/auth/components/AcceptInvitationForm';
import { isApiError } from '../../../lib/api-error';
import { roleDuty, roleLabel } from '../../../lib/roles';
import { useSessionControl } from '../../session-control';
import { PublicHeading } from './public-heading';

type InvitationPageData = { state: 'open'; token: string } | { state: 'broken' } | { state: 'closed'; message: string };

// Statuses the API uses for an invitation that cannot be used: unknown, already used or revoked, run out.
const closedStatuses = new Set([404, 409, 410]);

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs): Promise<InvitationPageData> => {
    const parsed = InvitationTokenParams.safeParse(params);
    if (!parsed.success) return { state: 'broken' };
    try {
      await queryClient.ensureQueryData(invitationQueryOptions(parsed.data.token));
      return { state: 'open', token: parsed.data.token };
    } catch (error) {
      if (isApiError(error) && closedStatuses.has(error.status)) return { state: 'closed', message: error.message };
      throw error;
    }
  };

export function Component() {
  const data = useLoaderData<InvitationPageData>();
  if (data.state === 'open') return <OpenInvitation token={data.token} />;
  return <ClosedInvitation reason={data.state === 'broken' ? null : data.message} />;
}

/** reason null: the link itself is broken; otherwise the server's sentence about why it is closed. */
function ClosedInvitation({ reason }: { reason: string | null }) {
  return (
    <>
      <PublicHeading title="Join a shop" />
      {reason === null ? (
        <Alert tone="warning" title="This invitation link is not complete" live="none">
          Open the link from the e-mail again, all of it.
        </Alert>
      ) : (
        <Alert tone="warning" title="This invitation can no longer be used" live="none">
          {reason} Ask the shop lead to send you a new invitation.
        </Alert>
      )}
      <p className="mt-6 border-t border-line pt-4 text-ink-soft">
        Already a member? <TextLink to={paths.signIn.getHref()}>Sign in</TextLink>
      </p>
    </>
  );
}

function OpenInvitation({ token }: { token: string }) {
  const control = useSessionControl();
  const invitation = useInvitation(token);
  return (
    <QueryResult query={invitation}>
      {(preview) =>
        Date.parse(preview.expiresAt) <= Date.now() ? (
          <ClosedInvitation reason="The invitation has run out." />
        ) : (
          <>
            <PublicHeading title={`Join ${preview.shopName}`}>
              You are invited as {roleLabel(preview.role).toLowerCase()}: {roleDuty(preview.role)}.
            </PublicHeading>
            <dl className="mb-6 grid grid-cols-[auto_minmax(0,1fr)] gap-x-4 gap-y-2 rounded-lg bg-paper p-4">
              <dt className="font-semibold text-ink-soft">Shop</dt>
              <dd>{preview.shopName}</dd>
              <dt className="font-semibold text-ink-soft">Role</dt>
              <dd>{roleLabel(preview.role)}</dd>
              <dt className="font-semibold text-ink-soft">E-mail</dt>
              <dd className="break-all">{preview.email}</dd>
              <dt className="font-semibold text-ink-soft">Open until</dt>
              <dd>
                <DateTime iso={preview.expiresAt} />
              </dd>
            </dl>
            {preview.accountExists ? (
              <p className="mb-4 text-ink-soft">You already have a Gelpoint account with this e-mail. Enter its password to add this shop.</p>
            ) : null}
            <AcceptInvitationForm token={token} invitation={preview} onJoined={() => control.signedIn(landingPath)} />
          </>
        )
      }
    </QueryResult>
  );
}
