import { z } from 'zod';
import { Email, Id, Password, Role, Timestamp, UserRef, text } from './common';
import { ResetToken } from './auth';

export const MemberStatus = z.enum(['active', 'disabled']);
export type MemberStatus = z.infer<typeof MemberStatus>;

export const Member = z.object({
  id: Id.describe('membership id'),
  userId: Id,
  name: z.string(),
  email: z.string(),
  role: Role,
  status: MemberStatus,
  joinedAt: Timestamp,
});
export type Member = z.infer<typeof Member>;

export const UpdateMemberRequest = z
  .object({ role: Role, status: MemberStatus })
  .partial()
  .strict()
  .refine((v) => v.role !== undefined || v.status !== undefined, { message: 'give a role or a status to change' });
export type UpdateMemberRequest = z.infer<typeof UpdateMemberRequest>;

export const InvitationStatus = z.enum(['pending', 'accepted', 'revoked', 'expired']);
export type InvitationStatus = z.infer<typeof InvitationStatus>;

export const Invitation = z.object({
  id: Id,
  email: z.string(),
  role: Role,
  status: InvitationStatus,
  invitedBy: UserRef.nullable(),
  createdAt: Timestamp,
  expiresAt: Timestamp,
});
export type Invitation = z.infer<typeof Invitation>;

export const CreateInvitationRequest = z.object({ email: Email, role: Role }).strict();
export type CreateInvitationRequest = z.infer<typeof CreateInvitationRequest>;

export const InvitationTokenParams = z.object({ token: ResetToken });

export const InvitationPreview = z.object({
  shopName: z.string(),
  email: z.string(),
  role: Role,
  expiresAt: Timestamp,
  accountExists: z.boolean().describe('true: sign in with the existing password to join; false: choose a name and password'),
});
export type InvitationPreview = z.infer<typeof InvitationPreview>;

export const AcceptInvitationRequest = z.object({
  name: text(120, 'your name').optional(),
  password: Password,
});
export type AcceptInvitationRequest = z.infer<typeof AcceptInvitationRequest>;
