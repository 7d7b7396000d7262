import type { InvitationStatus, MemberStatus } from '@gelpoint/contracts';

export type StatusShape = 'dot' | 'ring' | 'cross' | 'clock' | 'tick';

export const memberStatusWords: Record<MemberStatus, { label: string; shape: StatusShape }> = {
  active: { label: 'Active', shape: 'dot' },
  disabled: { label: 'Disabled', shape: 'cross' },
};

export const invitationStatusWords: Record<InvitationStatus, { label: string; shape: StatusShape }> = {
  pending: { label: 'Waiting for reply', shape: 'clock' },
  accepted: { label: 'Joined', shape: 'tick' },
  revoked: { label: 'Revoked', shape: 'cross' },
  expired: { label: 'Expired', shape: 'ring' },
};
