import { LotInput, LotListQuery, LotUpdate, LotUse, LotUsesQuery, LotView, Page, PigmentInput, PigmentListQuery, PigmentView, ResinSystemInput, ResinSystemListQuery, ResinSystemView } from '../shelf';
import { IdParams, route } from './route';

export const shelfRoutes = {
  listResinSystems: route({ method: 'get', path: '/shelf/resin-systems', tag: 'shelf', summary: 'Resin systems on the shelf, sorted by the chosen column (name unless told), then paged', access: 'member', query: ResinSystemListQuery, response: Page(ResinSystemView) }),
  createResinSystem: route({ method: 'post', path: '/shelf/resin-systems', tag: 'shelf', summary: 'Add a resin system from its data sheet', access: 'shelf:keep', body: ResinSystemInput, response: ResinSystemView, status: 201, idempotent: true }),
  getResinSystem: route({ method: 'get', path: '/shelf/resin-systems/:id', tag: 'shelf', summary: 'One resin system', access: 'member', params: IdParams, response: ResinSystemView }),
  replaceResinSystem: route({ method: 'put', path: '/shelf/resin-systems/:id', tag: 'shelf', summary: 'Replace a resin system with corrected data-sheet values (saved plans keep theirs)', access: 'shelf:keep', params: IdParams, body: ResinSystemInput, response: ResinSystemView }),
  archiveResinSystem: route({ method: 'delete', path: '/shelf/resin-systems/:id', tag: 'shelf', summary: 'Archive a resin system', access: 'shelf:keep', params: IdParams }),

  listPigments: route({ method: 'get', path: '/shelf/pigments', tag: 'shelf', summary: 'Pigments on the shelf, sorted by the chosen column (name unless told), then paged', access: 'member', query: PigmentListQuery, response: Page(PigmentView) }),
  createPigment: route({ method: 'post', path: '/shelf/pigments', tag: 'shelf', summary: 'Add a pigment', access: 'shelf:keep', body: PigmentInput, response: PigmentView, status: 201, idempotent: true }),
  getPigment: route({ method: 'get', path: '/shelf/pigments/:id', tag: 'shelf', summary: 'One pigment', access: 'member', params: IdParams, response: PigmentView }),
  replacePigment: route({ method: 'put', path: '/shelf/pigments/:id', tag: 'shelf', summary: 'Replace a pigment', access: 'shelf:keep', params: IdParams, body: PigmentInput, response: PigmentView }),
  archivePigment: route({ method: 'delete', path: '/shelf/pigments/:id', tag: 'shelf', summary: 'Archive a pigment', access: 'shelf:keep', params: IdParams }),

  listLots: route({ method: 'get', path: '/shelf/lots', tag: 'shelf', summary: 'Lots on the shelf, sorted by the chosen column (soonest expiry unless told), then paged', access: 'member', query: LotListQuery, response: Page(LotView) }),
  createLot: route({ method: 'post', path: '/shelf/lots', tag: 'shelf', summary: 'Receive a lot of part A, part B or a pigment', access: 'shelf:keep', body: LotInput, response: LotView, status: 201, idempotent: true }),
  getLot: route({ method: 'get', path: '/shelf/lots/:id', tag: 'shelf', summary: 'One lot', access: 'member', params: IdParams, response: LotView }),
  updateLot: route({ method: 'patch', path: '/shelf/lots/:id', tag: 'shelf', summary: 'Correct a lot (number, remaining stock, expiry, notes)', access: 'shelf:keep', params: IdParams, body: LotUpdate, response: LotView }),
  deleteLot: route({ method: 'delete', path: '/shelf/lots/:id', tag: 'shelf', summary: 'Remove a lot entered by mistake', access: 'shelf:keep', params: IdParams }),
  lotUses: route({ method: 'get', path: '/shelf/lots/:id/uses', tag: 'shelf', summary: 'Every batch mixed from a lot, newest first: pour, piece, grams weighed, who mixed it and when', access: 'member', params: IdParams, query: LotUsesQuery, response: Page(LotUse) }),
};
