export type SignInNotice = 'password-changed' | 'session-ended' | 'signed-out';

export interface SignInLink {
  returnTo?: string;
  notice?: SignInNotice;
}

export interface PiecesLink {
  stage?: string;
  q?: string;
  page?: number;
}

export interface AuditLink {
  before?: string;
}

function withSearch(path: string, entries: Record<string, string | number | undefined>): string {
  const search = new URLSearchParams();
  for (const [name, value] of Object.entries(entries)) {
    if (value === undefined || value === '') continue;
    search.set(name, String(value));
  }
  const qs = search.toString();
  return qs ? `${path}?${qs}` : path;
}

/** Every page of the web app: `path` is the route pattern, `getHref` builds a link to it. */
export const paths = {
  home: { path: '/', getHref: () => '/' },

  signIn: {
    path: '/sign-in',
    getHref: (link: SignInLink = {}) => withSearch('/sign-in', { returnTo: link.returnTo, notice: link.notice }),
  },
  createShop: { path: '/create-shop', getHref: () => '/create-shop' },
  forgotPassword: { path: '/forgot-password', getHref: () => '/forgot-password' },
  resetPassword: {
    path: '/reset-password',
    getHref: (token?: string) => withSearch('/reset-password', { token }),
  },
  acceptInvitation: {
    path: '/invitations/:token',
    getHref: (token: string) => `/invitations/${encodeURIComponent(token)}`,
  },

  today: { path: '/today', getHref: () => '/today' },
  pieces: {
    path: '/pieces',
    getHref: (link: PiecesLink = {}) =>
      withSearch('/pieces', { stage: link.stage, q: link.q, page: link.page !== undefined && link.page > 1 ? link.page : undefined }),
  },
  newPiece: { path: '/pieces/new', getHref: () => '/pieces/new' },
  piece: {
    path: '/pieces/:pieceId',
    getHref: (pieceId: string) => `/pieces/${encodeURIComponent(pieceId)}`,
  },
  moulds: { path: '/moulds', getHref: () => '/moulds' },
  pourPlans: { path: '/pour-plans', getHref: () => '/pour-plans' },
  cureBoard: { path: '/cure-board', getHref: () => '/cure-board' },
  shelf: { path: '/shelf', getHref: () => '/shelf' },
  team: { path: '/team', getHref: () => '/team' },
  shopSettings: { path: '/shop-settings', getHref: () => '/shop-settings' },
  audit: {
    path: '/audit',
    getHref: (link: AuditLink = {}) => withSearch('/audit', { before: link.before }),
  },
} as const;

export type PathName = keyof typeof paths;

/** Where a signed-in person lands when nothing else was asked for. */
export const landingPath = paths.today.getHref();
