import type { DataSource } from 'typeorm';
import { Piece as PieceRow } from '@gelpoint/db';
import type { CreatePieceRequest, Piece, PieceList, UpdatePieceRequest } from '@gelpoint/contracts';
import { CreatePieceRequest as CreateSchema } from '@gelpoint/contracts';
import type { z } from 'zod';
import type { AuthContext } from '../../http/auth-context';
import { notFound } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';

export const pieceView = (p: PieceRow): Piece => ({
  id: p.id,
  name: p.name,
  wood: p.wood,
  notes: p.notes,
  stage: p.stage,
  createdBy: p.createdBy ? { id: p.createdBy.id, name: p.createdBy.name } : null,
  createdAt: p.createdAt.toISOString(),
  updatedAt: p.updatedAt.toISOString(),
});

export interface PieceFilter {
  stage?: Piece['stage'];
  q?: string;
  limit: number;
  offset: number;
}

export async function listPieces(ds: DataSource, shopId: string, f: PieceFilter): Promise<PieceList> {
  const qb = ds
    .getRepository(PieceRow)
    .createQueryBuilder('p')
    .leftJoinAndSelect('p.createdBy', 'u')
    .where('p.shop_id = :shopId', { shopId })
    .orderBy('p.updatedAt', 'DESC')
    .addOrderBy('p.id')
    .take(f.limit)
    .skip(f.offset);
  if (f.stage) qb.andWhere('p.stage = :stage', { stage: f.stage });
  if (f.q) {
    const like = `%${f.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    qb.andWhere('(p.name ILIKE :like OR p.wood ILIKE :like OR p.notes ILIKE :like)', { like });
  }
  const [rows, total] = await qb.getManyAndCount();
  return { items: rows.map(pieceView), total };
}

async function findPiece(ds: DataSource, shopId: string, id: string): Promise<PieceRow> {
  const piece = await ds.getRepository(PieceRow).findOne({ where: { id, shopId }, relations: { createdBy: true } });
  if (!piece) throw notFound('piece');
  return piece;
}

export async function getPiece(ds: DataSource, shopId: string, id: string): Promise<Piece> {
  return pieceView(await findPiece(ds, shopId, id));
}

export async function createPiece(ds: DataSource, auth: AuthContext, input: z.output<typeof CreateSchema> | CreatePieceRequest): Promise<Piece> {
  const id = await ds.transaction(async (m) => {
    const piece = await m.save(m.create(PieceRow, { ...input, shopId: auth.shopId, createdById: auth.userId }));
    await recordAudit(m, { shopId: auth.shopId, actor: auth, action: 'piece.create', objectType: 'piece', objectId: piece.id, detail: { name: piece.name } });
    return piece.id;
  });
  return getPiece(ds, auth.shopId, id);
}

export async function updatePiece(ds: DataSource, auth: AuthContext, id: string, change: UpdatePieceRequest): Promise<Piece> {
  await ds.transaction(async (m) => {
    const piece = await m.findOne(PieceRow, { where: { id, shopId: auth.shopId }, lock: { mode: 'pessimistic_write' } });
    if (!piece) throw notFound('piece');
    const before = { stage: piece.stage, name: piece.name };
    Object.assign(piece, change);
    await m.save(piece);
    await recordAudit(m, { shopId: auth.shopId, actor: auth, action: 'piece.update', objectType: 'piece', objectId: id, detail: { before, change } });
  });
  return getPiece(ds, auth.shopId, id);
}

export async function deletePiece(ds: DataSource, auth: AuthContext, id: string): Promise<void> {
  await ds.transaction(async (m) => {
    const piece = await m.findOneBy(PieceRow, { id, shopId: auth.shopId });
    if (!piece) throw notFound('piece');
    await m.delete(PieceRow, { id });
    await recordAudit(m, { shopId: auth.shopId, actor: auth, action: 'piece.delete', objectType: 'piece', objectId: id, detail: { name: piece.name } });
  });
}
