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
  /** The oldest event already shown: its exact time and its id. */
  before?: string;
  beforeId?: string;
  /** Filters: a member's user id, a kind of event, the reader's first and last calendar day. */
  who?: string;
  kind?: string;
  from?: string;
  to?: string;
}

export interface NewMouldLink {
  pieceId?: string;
}

export interface ShelfLink {
  tab?: 'resin-systems' | 'pigments' | 'lots';
  q?: string;
  page?: number;
  sort?: string;
  dir?: 'ascending' | 'descending';
  archived?: boolean;
  status?: string;
  part?: string;
}

export interface PourPlansLink {
  pieceId?: string;
  page?: number;
}

export interface CureBoardLink {
  status?: 'active' | 'released' | 'machined' | 'all';
  readyToday?: boolean;
  page?: number;
}

export interface NewPourLink {
  planId?: string;
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
  pieceRecord: {
    path: '/pieces/:pieceId/record',
    getHref: (pieceId: string) => `/pieces/${encodeURIComponent(pieceId)}/record`,
  },
  moulds: { path: '/moulds', getHref: () => '/moulds' },
  newMould: {
    path: '/moulds/new',
    getHref: (link: NewMouldLink = {}) => withSearch('/moulds/new', { pieceId: link.pieceId }),
  },
  mould: {
    path: '/moulds/:moldId',
    getHref: (moldId: string) => `/moulds/${encodeURIComponent(moldId)}`,
  },
  pourPlans: {
    path: '/pour-plans',
    getHref: (link: PourPlansLink = {}) =>
      withSearch('/pour-plans', { pieceId: link.pieceId, page: link.page !== undefined && link.page > 1 ? link.page : undefined }),
  },
  newPourPlan: {
    path: '/pieces/:pieceId/pour-plans/new',
    getHref: (pieceId: string) => `/pieces/${encodeURIComponent(pieceId)}/pour-plans/new`,
  },
  pourPlan: {
    path: '/pour-plans/:planId',
    getHref: (planId: string) => `/pour-plans/${encodeURIComponent(planId)}`,
  },
  editPourPlan: {
    path: '/pour-plans/:planId/edit',
    getHref: (planId: string) => `/pour-plans/${encodeURIComponent(planId)}/edit`,
  },
  runSheet: {
    path: '/pour-plans/:planId/run-sheet',
    getHref: (planId: string) => `/pour-plans/${encodeURIComponent(planId)}/run-sheet`,
  },
  cureBoard: {
    path: '/cure-board',
    getHref: (link: CureBoardLink = {}) =>
      withSearch('/cure-board', {
        status: link.status === 'active' ? undefined : link.status,
        readyToday: link.readyToday ? 'true' : undefined,
        page: link.page !== undefined && link.page > 1 ? link.page : undefined,
      }),
  },
  newPour: {
    path: '/pours/new',
    getHref: (link: NewPourLink = {}) => withSearch('/pours/new', { planId: link.planId }),
  },
  pour: {
    path: '/pours/:pourId',
    getHref: (pourId: string) => `/pours/${encodeURIComponent(pourId)}`,
  },
  shelf: {
    path: '/shelf',
    getHref: (link: ShelfLink = {}) =>
      withSearch('/shelf', {
        tab: link.tab === 'resin-systems' ? undefined : link.tab,
        q: link.q,
        page: link.page !== undefined && link.page > 1 ? link.page : undefined,
        sort: link.sort,
        dir: link.sort && link.dir === 'descending' ? link.dir : undefined,
        archived: link.archived ? 'true' : undefined,
        status: link.status,
        part: link.part,
      }),
  },
  newResinSystem: { path: '/shelf/resin-systems/new', getHref: () => '/shelf/resin-systems/new' },
  resinSystem: {
    path: '/shelf/resin-systems/:resinSystemId',
    getHref: (resinSystemId: string) => `/shelf/resin-systems/${encodeURIComponent(resinSystemId)}`,
  },
  newPigment: { path: '/shelf/pigments/new', getHref: () => '/shelf/pigments/new' },
  pigment: {
    path: '/shelf/pigments/:pigmentId',
    getHref: (pigmentId: string) => `/shelf/pigments/${encodeURIComponent(pigmentId)}`,
  },
  newLot: { path: '/shelf/lots/new', getHref: () => '/shelf/lots/new' },
  lot: {
    path: '/shelf/lots/:lotId',
    /** `page` pages the batches mixed from the lot. */
    getHref: (lotId: string, link: { page?: number } = {}) =>
      withSearch(`/shelf/lots/${encodeURIComponent(lotId)}`, { page: link.page !== undefined && link.page > 1 ? link.page : undefined }),
  },
  team: { path: '/team', getHref: () => '/team' },
  account: { path: '/account', getHref: () => '/account' },
  shopSettings: { path: '/shop-settings', getHref: () => '/shop-settings' },
  audit: {
    path: '/audit',
    getHref: (link: AuditLink = {}) =>
      withSearch('/audit', {
        who: link.who,
        kind: link.kind,
        from: link.from,
        to: link.to,
        before: link.before,
        beforeId: link.before ? link.beforeId : undefined,
      }),
  },
} as const;

export type PathName = keyof typeof paths;

/** Where a signed-in person lands when nothing else was asked for. */
export const landingPath = paths.today.getHref();
