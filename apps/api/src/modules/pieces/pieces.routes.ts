import type { DataSource } from 'typeorm';
import { z } from 'zod';
import { CreatePieceRequest, Id, Piece, PieceList, PieceListQuery, UpdatePieceRequest } from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';
import { createPiece, deletePiece, getPiece, listPieces, updatePiece } from './pieces.service';

const IdParams = z.object({ id: Id });

export function pieceRoutes(api: RouteRegistry, ds: DataSource): void {
  api.add({ method: 'get', path: '/pieces', tag: 'pieces', summary: 'Pieces of the shop, most recently changed first', access: 'member', query: PieceListQuery, response: PieceList }, ({ auth, query }) =>
    listPieces(ds, auth.shopId, query),
  );
  api.add({ method: 'post', path: '/pieces', tag: 'pieces', summary: 'Start a piece of work', access: ['lead', 'maker'], body: CreatePieceRequest, response: Piece, status: 201, idempotent: true }, ({ auth, body }) =>
    createPiece(ds, auth, body),
  );
  api.add({ method: 'get', path: '/pieces/:id', tag: 'pieces', summary: 'One piece', access: 'member', params: IdParams, response: Piece }, ({ auth, params }) =>
    getPiece(ds, auth.shopId, params.id),
  );
  api.add(
    { method: 'patch', path: '/pieces/:id', tag: 'pieces', summary: 'Change a piece (name, wood, notes, stage)', access: ['lead', 'maker'], params: IdParams, body: UpdatePieceRequest, response: Piece },
    ({ auth, params, body }) => updatePiece(ds, auth, params.id, body),
  );
  api.add({ method: 'delete', path: '/pieces/:id', tag: 'pieces', summary: 'Delete a piece', access: ['lead'], params: IdParams }, async ({ auth, params }) => {
    await deletePiece(ds, auth, params.id);
    return undefined;
  });
}
