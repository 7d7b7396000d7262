import { roles, type Member, type Role } from '@gelpoint/contracts';
import { useId, useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { ConfirmDialog } from '../../../components/ui/ConfirmDialog';
import { ErrorAlert } from '../../../components/ui/ErrorAlert';
import { Select } from '../../../components/ui/Select';
import { Table, Td, Th, Thead, Tr } from '../../../components/ui/Table';
import { errorNotice } from '../../../lib/error-notice';
import { roleLabel } from '../../../lib/roles';
import { useUpdateMember } from '../api/update-member';
import { memberStatusWords } from '../utils/status-words';
import { StatusMark } from './StatusMark';

const roleOptions = roles.map((role) => ({ value: role, label: roleLabel(role) }));

export interface MembersTableProps {
  members: readonly Member[];
  currentUserId: string;
  /** Told about every saved change, e.g. so the header can refresh a lead's own role. */
  onMemberChanged?: (member: Member) => unknown;
}

export function MembersTable({ members, currentUserId, onMemberChanged }: MembersTableProps) {
  return (
    <Table caption="Members of this shop">
      <Thead>
        <tr>
          <Th>Name</Th>
          <Th>Email</Th>
          <Th>Role</Th>
          <Th>Status</Th>
          <Th>
            <span className="sr-only">Access</span>
          </Th>
        </tr>
      </Thead>
      <tbody>
        {members.map((member) => (
          <MemberRow key={member.id} member={member} isYou={member.userId === currentUserId} onMemberChanged={onMemberChanged} />
        ))}
      </tbody>
    </Table>
  );
}

interface MemberRowProps {
  member: Member;
  isYou: boolean;
  onMemberChanged?: ((member: Member) => unknown) | undefined;
}

function MemberRow({ member, isYou, onMemberChanged }: MemberRowProps) {
  const roleSelectId = useId();
  const errorId = useId();
  const [role, setRole] = useState<Role>(member.role);
  const [askingDisable, setAskingDisable] = useState(false);
  const roleChange = useUpdateMember({ onSuccess: onMemberChanged });
  const statusChange = useUpdateMember({
    onSuccess: async (changed) => {
      setAskingDisable(false);
      await onMemberChanged?.(changed);
    },
  });
  const status = memberStatusWords[member.status];

  return (
    <Tr>
      <Td className="font-semibold">
        {member.name}
        {isYou ? <span className="ml-2 rounded-full bg-walnut-100 px-2 py-0.5 text-sm text-walnut-800">you</span> : null}
      </Td>
      <Td>{member.email}</Td>
      <Td>
        <form
          className="flex items-center gap-2"
          onSubmit={(event) => {
            event.preventDefault();
            roleChange.mutate({ memberId: member.id, changes: { role } });
          }}
        >
          <label htmlFor={roleSelectId} className="sr-only">
            {`Role for ${member.name}`}
          </label>
          <div className="w-40">
            <Select
              id={roleSelectId}
              value={role}
              onChange={(event) => setRole(event.target.value as Role)}
              options={roleOptions}
              aria-describedby={roleChange.isError ? errorId : undefined}
            />
          </div>
          <Button type="submit" variant="secondary" busy={roleChange.isPending} disabled={role === member.role} aria-label={`Save role for ${member.name}`}>
            Save
          </Button>
        </form>
        {roleChange.isError ? (
          <p id={errorId} role="alert" className="mt-1 text-sm font-semibold text-ember-700">
            {errorNotice(roleChange.error).message}
          </p>
        ) : null}
      </Td>
      <Td>
        <StatusMark shape={status.shape} label={status.label} />
      </Td>
      <Td>
        {member.status === 'active' ? (
          <Button variant="secondary" onClick={() => setAskingDisable(true)} aria-label={`Disable ${member.name}`}>
            Disable
          </Button>
        ) : (
          <Button
            variant="secondary"
            busy={statusChange.isPending}
            onClick={() => statusChange.mutate({ memberId: member.id, changes: { status: 'active' } })}
            aria-label={`Enable ${member.name}`}
          >
            Enable
          </Button>
        )}
        {statusChange.isError && !askingDisable ? (
          <p role="alert" className="mt-1 text-sm font-semibold text-ember-700">
            {errorNotice(statusChange.error).message}
          </p>
        ) : null}
        <ConfirmDialog
          open={askingDisable}
          title={`Disable ${member.name}?`}
          confirmLabel="Disable"
          busy={statusChange.isPending}
          error={statusChange.isError ? <ErrorAlert error={statusChange.error} /> : null}
          onCancel={() => {
            statusChange.reset();
            setAskingDisable(false);
          }}
          onConfirm={() => statusChange.mutate({ memberId: member.id, changes: { status: 'disabled' } })}
        >
          {isYou
            ? 'You will be signed out of this shop and cannot come back until another lead enables you.'
            : `${member.name} can no longer sign in to this shop. Their batches and logs stay. You can enable them again later.`}
        </ConfirmDialog>
      </Td>
    </Tr>
  );
}
