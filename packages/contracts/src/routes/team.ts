import { z } from 'zod';
import { SessionResponse } from '../auth';
import { AcceptInvitationRequest, CreateInvitationRequest, Invitation, InvitationPreview, InvitationTokenParams, Member, UpdateMemberRequest } from '../team';
import { IdParams, route } from './route';

export const teamRoutes = {
  listMembers: route({
    method: 'get',
    path: '/shop/members',
    tag: 'team',
    summary: 'Members of the shop with their roles',
    access: 'member',
    response: z.array(Member),
  }),
  updateMember: route({
    method: 'patch',
    path: '/shop/members/:id',
    tag: 'team',
    summary: "Change a member's role, or disable/enable them (disabling ends their sessions)",
    access: 'team:manage',
    params: IdParams,
    body: UpdateMemberRequest,
    response: Member,
  }),
  listInvitations: route({
    method: 'get',
    path: '/shop/invitations',
    tag: 'team',
    summary: 'Invitations sent by the shop',
    access: 'team:manage',
    response: z.array(Invitation),
  }),
  createInvitation: route({
    method: 'post',
    path: '/shop/invitations',
    tag: 'team',
    summary: 'Invite someone by e-mail with a role; the link works once and expires',
    access: 'team:manage',
    body: CreateInvitationRequest,
    response: Invitation,
    status: 201,
    idempotent: true,
  }),
  revokeInvitation: route({
    method: 'delete',
    path: '/shop/invitations/:id',
    tag: 'team',
    summary: 'Withdraw a pending invitation',
    access: 'team:manage',
    params: IdParams,
  }),
  previewInvitation: route({
    method: 'get',
    path: '/invitations/:token',
    tag: 'team',
    summary: 'What an invitation link offers (shop, role, e-mail)',
    access: 'public',
    params: InvitationTokenParams,
    response: InvitationPreview,
  }),
  acceptInvitation: route({
    method: 'post',
    path: '/invitations/:token/accept',
    tag: 'team',
    summary: 'Accept an invitation: creates the account or joins with the existing one, and signs in',
    access: 'public',
    params: InvitationTokenParams,
    body: AcceptInvitationRequest,
    response: SessionResponse,
  }),
};
