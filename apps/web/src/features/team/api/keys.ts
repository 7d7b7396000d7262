export const teamKeys = {
  all: ['team'] as const,
  members: () => [...teamKeys.all, 'members'] as const,
  memberList: () => [...teamKeys.members(), 'list'] as const,
  invitations: () => [...teamKeys.all, 'invitations'] as const,
  invitationList: () => [...teamKeys.invitations(), 'list'] as const,
};
