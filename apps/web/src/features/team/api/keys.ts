export const teamKeys = {
  all: ['team'] as const,
  invitations: () => [...teamKeys.all, 'invitations'] as const,
  invitationList: () => [...teamKeys.invitations(), 'list'] as const,
};
