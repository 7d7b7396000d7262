import { CreatePieceRequest, Piece, PieceList, PieceListQuery, UpdatePieceRequest } from '../pieces';
import { IdParams, route } from './route';

export const pieceRoutes = {
  listPieces: route({
    method: 'get',
    path: '/pieces',
    tag: 'pieces',
    summary: 'Pieces of the shop, most recently changed first',
    access: 'member',
    query: PieceListQuery,
    response: PieceList,
  }),
  createPiece: route({
    method: 'post',
    path: '/pieces',
    tag: 'pieces',
    summary: 'Start a piece of work',
    access: 'piece:create',
    body: CreatePieceRequest,
    response: Piece,
    status: 201,
    idempotent: true,
  }),
  getPiece: route({ method: 'get', path: '/pieces/:id', tag: 'pieces', summary: 'One piece', access: 'member', params: IdParams, response: Piece }),
  updatePiece: route({
    method: 'patch',
    path: '/pieces/:id',
    tag: 'pieces',
    summary: 'Change a piece (name, wood, notes, stage)',
    access: 'piece:edit',
    params: IdParams,
    body: UpdatePieceRequest,
    response: Piece,
  }),
  deletePiece: route({ method: 'delete', path: '/pieces/:id', tag: 'pieces', summary: 'Delete a piece', access: 'piece:delete', params: IdParams }),
};
