import { can } from '@gelpoint/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { Card } from '../../../components/ui/Card';
import { DocumentTitle } from '../../../components/ui/DocumentTitle';
import { EmptyState } from '../../../components/ui/EmptyState';
import { PageHeader } from '../../../components/ui/PageHeader';
import { QueryResult } from '../../../components/ui/QueryResult';
import { authKeys } from '../../../lib/resources/session';
import { invitationsQueryOptions, useInvitations } from '../../../features/team/api/get-invitations';
import { InvitationsTable } from '../../../features/team/components/InvitationsTable';
import { InviteForm } from '../../../features/team/components/InviteForm';
import { MembersTable } from '../../../features/team/components/MembersTable';
import { useSignedInSession } from '../../signed-in-session';
import { requireSession } from '../../session-loaders';
import { LeadOnlyNotice } from './lead-only';
import { membersQueryOptions } from '../../../lib/resources/shop';

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const session = await requireSession(queryClient, request);
    // Only a lead gets an answer; anyone else sees the notice without a round of 403s.
    if (can(session.role, 'team:manage')) {
      await Promise.all([queryClient.ensureQueryData(membersQueryOptions()), queryClient.ensureQueryData(invitationsQueryOptions())]);
    }
    return null;
  };

export function Component() {
  const session = useSignedInSession();
  return (
    <>
      <DocumentTitle title="Team" />
      <PageHeader title="Team" description="Who works in this shop, and what each of them may do." />
      {can(session.role, 'team:manage') ? <TeamAreas currentUserId={session.user.id} /> : <LeadOnlyNotice area="the team" role={session.role} />}
    </>
  );
}

function TeamAreas({ currentUserId }: { currentUserId: string }) {
  const queryClient = useQueryClient();
  const members = useQuery(membersQueryOptions());
  const invitations = useInvitations();

  return (
    <div className="flex flex-col gap-6">
      <Card title="Members">
        <QueryResult query={members} loadingLabel="Loading members…">
          {(list) => (
            <MembersTable
              members={list}
              currentUserId={currentUserId}
              onMemberChanged={() => queryClient.invalidateQueries({ queryKey: authKeys.session() })}
            />
          )}
        </QueryResult>
      </Card>
      <Card title="Invite someone">
        <InviteForm />
      </Card>
      <Card title="Invitations">
        <QueryResult query={invitations} loadingLabel="Loading invitations…">
          {(list) =>
            list.length === 0 ? (
              <EmptyState title="No invitations yet" headingLevel={3}>
                Invite makers and apprentices by e-mail; they choose their own password when they join.
              </EmptyState>
            ) : (
              <InvitationsTable invitations={list} />
            )
          }
        </QueryResult>
      </Card>
    </div>
  );
}
