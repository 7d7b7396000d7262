/** The session and invitation keys: who is signed in is read by the frame, the account page and sign-in alike. */
export const authKeys = {
  all: ['auth'] as const,
  session: () => [...authKeys.all, 'session'] as const,
  invitations: () => [...authKeys.all, 'invitation'] as const,
  invitation: (token: string) => [...authKeys.invitations(), token] as const,
};
