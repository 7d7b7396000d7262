import type { DataSource } from 'typeorm';
import { z } from 'zod';
import {
  AcceptInvitationRequest,
  CreateInvitationRequest,
  Id,
  Invitation,
  InvitationPreview,
  InvitationTokenParams,
  Member,
  SessionResponse,
  UpdateMemberRequest,
} from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';
import { setSessionCookie } from '../auth/session.service';
import { acceptInvitation, createInvitation, listInvitations, previewInvitation, revokeInvitation, type InvitationSettings } from './invitations.service';
import { listMembers, updateMember } from './members.service';

const IdParams = z.object({ id: Id });

export function teamRoutes(api: RouteRegistry, ds: DataSource, s: InvitationSettings): void {
  api.add({ method: 'get', path: '/shop/members', tag: 'team', summary: 'Members of the shop with their roles', access: 'member', response: z.array(Member) }, ({ auth }) =>
    listMembers(ds, auth.shopId),
  );

  api.add(
    { method: 'patch', path: '/shop/members/:id', tag: 'team', summary: "Change a member's role, or disable/enable them (disabling ends their sessions)", access: ['lead'], params: IdParams, body: UpdateMemberRequest, response: Member },
    ({ auth, params, body }) => updateMember(ds, auth, params.id, body),
  );

  api.add({ method: 'get', path: '/shop/invitations', tag: 'team', summary: 'Invitations sent by the shop', access: ['lead'], response: z.array(Invitation) }, ({ auth }) =>
    listInvitations(ds, auth.shopId),
  );

  api.add(
    { method: 'post', path: '/shop/invitations', tag: 'team', summary: 'Invite someone by e-mail with a role; the link works once and expires', access: ['lead'], body: CreateInvitationRequest, response: Invitation, status: 201, idempotent: true },
    ({ auth, body }) => createInvitation(ds, s, auth, body),
  );

  api.add(
    { method: 'delete', path: '/shop/invitations/:id', tag: 'team', summary: 'Withdraw a pending invitation', access: ['lead'], params: IdParams },
    async ({ auth, params }) => {
      await revokeInvitation(ds, auth, params.id);
      return undefined;
    },
  );

  api.add(
    { method: 'get', path: '/invitations/:token', tag: 'team', summary: 'What an invitation link offers (shop, role, e-mail)', access: 'public', params: InvitationTokenParams, response: InvitationPreview },
    ({ params }) => previewInvitation(ds, params.token),
  );

  api.add(
    { method: 'post', path: '/invitations/:token/accept', tag: 'team', summary: 'Accept an invitation: creates the account or joins with the existing one, and signs in', access: 'public', params: InvitationTokenParams, body: AcceptInvitationRequest, response: SessionResponse },
    async ({ params, body, req, res }) => {
      const session = await acceptInvitation(ds, s, params.token, body, req.get('user-agent') ?? '');
      setSessionCookie(res, s, session);
      return session;
    },
  );
}
