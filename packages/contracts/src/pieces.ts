import { z } from 'zod';
import { Id, Timestamp, UserRef, requiredText, text } from './common';

export const pieceStages = ['planning', 'pouring', 'curing', 'ready', 'released', 'finishing', 'done'] as const;
export const PieceStage = z.enum(pieceStages, {
  message: `stage must be one of ${pieceStages.join(', ')}`,
});
export type PieceStage = z.infer<typeof PieceStage>;

export const Piece = z.object({
  id: Id,
  name: z.string(),
  wood: z.string(),
  notes: z.string(),
  stage: PieceStage,
  createdBy: UserRef.nullable(),
  createdAt: Timestamp,
  updatedAt: Timestamp,
});
export type Piece = z.infer<typeof Piece>;

export const CreatePieceRequest = z
  .object({
    name: requiredText(120, 'name'),
    wood: text(120, 'wood').default(''),
    notes: text(4000, 'notes').default(''),
    stage: PieceStage.default('planning'),
  })
  .strict();
export type CreatePieceRequest = z.input<typeof CreatePieceRequest>;

export const UpdatePieceRequest = z
  .object({
    name: requiredText(120, 'name'),
    wood: text(120, 'wood'),
    notes: text(4000, 'notes'),
    stage: PieceStage,
  })
  .partial()
  .strict();
export type UpdatePieceRequest = z.infer<typeof UpdatePieceRequest>;

export const PieceListQuery = z
  .object({
    stage: PieceStage.optional(),
    q: text(120, 'search').optional(),
    limit: z.coerce.number().int().min(1).max(200).default(50),
    offset: z.coerce.number().int().min(0).max(1_000_000).default(0),
  })
  .strict();

export const PieceList = z.object({ items: z.array(Piece), total: z.number().int() });
export type PieceList = z.infer<typeof PieceList>;
