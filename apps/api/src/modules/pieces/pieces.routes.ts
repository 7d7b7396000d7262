import type { DataSource } from 'typeorm';
import { pieceRoutes as routes } from '@gelpoint/contracts';
import type { RouteRegistry } from '../../http/route-registry';
import { createPiece, deletePiece, getPiece, listPieces, updatePiece } from './pieces.service';

export function pieceRoutes(api: RouteRegistry, ds: DataSource): void {
  api.implement(routes, {
    listPieces: ({ auth, query }) => listPieces(ds, auth.shopId, query),
    createPiece: ({ auth, body }) => createPiece(ds, auth, body),
    getPiece: ({ auth, params }) => getPiece(ds, auth.shopId, params.id),
    updatePiece: ({ auth, params, body }) => updatePiece(ds, auth, params.id, body),
    deletePiece: async ({ auth, params }) => {
      await deletePiece(ds, auth, params.id);
      return undefined;
    },
  });
}
