import type { Invitation } from '@gelpoint/contracts';
import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { ConfirmDialog } from '../../../components/ui/ConfirmDialog';
import { DateTime } from '../../../components/ui/DateTime';
import { ErrorAlert } from '../../../components/ui/ErrorAlert';
import { Table, Td, Th, Thead, Tr } from '../../../components/ui/Table';
import { roleLabel } from '../../../lib/roles';
import { useRevokeInvitation } from '../api/revoke-invitation';
import { invitationStatusWords } from '../utils/status-words';
import { StatusMark } from './StatusMark';

export function InvitationsTable({ invitations }: { invitations: readonly Invitation[] }) {
  return (
    <Table caption="Invitations sent from this shop">
      <Thead>
        <tr>
          <Th>Email</Th>
          <Th>Role</Th>
          <Th>Status</Th>
          <Th>Expires</Th>
          <Th>
            <span className="sr-only">Revoke</span>
          </Th>
        </tr>
      </Thead>
      <tbody>
        {invitations.map((invitation) => (
          <InvitationRow key={invitation.id} invitation={invitation} />
        ))}
      </tbody>
    </Table>
  );
}

function InvitationRow({ invitation }: { invitation: Invitation }) {
  const [asking, setAsking] = useState(false);
  const revoke = useRevokeInvitation();
  const status = invitationStatusWords[invitation.status];

  return (
    <Tr>
      <Td className="font-semibold">{invitation.email}</Td>
      <Td>{roleLabel(invitation.role)}</Td>
      <Td>
        <StatusMark shape={status.shape} label={status.label} />
      </Td>
      <Td>
        <DateTime iso={invitation.expiresAt} />
      </Td>
      <Td>
        {invitation.status === 'pending' ? (
          <>
            <Button variant="secondary" onClick={() => setAsking(true)} aria-label={`Revoke the invitation for ${invitation.email}`}>
              Revoke
            </Button>
            <ConfirmDialog
              open={asking}
              title={`Revoke the invitation for ${invitation.email}?`}
              confirmLabel="Revoke"
              cancelLabel="Keep it"
              busy={revoke.isPending}
              error={revoke.isError ? <ErrorAlert error={revoke.error} /> : null}
              onCancel={() => {
                revoke.reset();
                setAsking(false);
              }}
              onConfirm={() => revoke.mutate(invitation.id, { onSuccess: () => setAsking(false) })}
            >
              The link in their e-mail stops working. You can send a new invitation any time.
            </ConfirmDialog>
          </>
        ) : null}
      </Td>
    </Tr>
  );
}
