import type { DataSource } from 'typeorm';
import { teamRoutes as routes } from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';
import { setSessionCookie } from '../auth/session.service';
import { acceptInvitation, createInvitation, listInvitations, previewInvitation, revokeInvitation, type InvitationSettings } from './invitations.service';
import { listMembers, updateMember } from './members.service';

export function teamRoutes(api: RouteRegistry, ds: DataSource, s: InvitationSettings): void {
  api.implement(routes, {
    listMembers: ({ auth }) => listMembers(ds, auth.shopId),
    updateMember: ({ auth, params, body }) => updateMember(ds, auth, params.id, body),
    listInvitations: ({ auth }) => listInvitations(ds, auth.shopId),
    createInvitation: ({ auth, body }) => createInvitation(ds, s, auth, body),
    revokeInvitation: async ({ auth, params }) => {
      await revokeInvitation(ds, auth, params.id);
      return undefined;
    },
    previewInvitation: ({ params }) => previewInvitation(ds, params.token),
    acceptInvitation: async ({ params, body, req, res }) => {
      const session = await acceptInvitation(ds, s, params.token, body, req.get('user-agent') ?? '');
      setSessionCookie(res, s, session);
      return session;
    },
  });
}
