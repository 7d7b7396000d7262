import { z } from 'zod';
import { Id, Timestamp, text } from './common';

/** The units a maker chooses for a file that carries none (STL, OBJ), or to override a 3MF's own. */
export const MoldUnits = z.enum(['mm', 'cm', 'in'], { message: 'units must be mm, cm or in' });
/** The units a stored mould was read in: a 3MF may also state micron (um), metre (m) or foot (ft). */
export const MoldFileUnits = z.enum(['um', 'mm', 'cm', 'm', 'in', 'ft']);
/** The mould file's format, told from its content. */
export const MoldFormat = z.enum(['stl', '3mf', 'obj']);
export const UpAxis = z.enum(['x', 'y', 'z'], { message: 'up must be x, y or z' });
export const Dam = z.enum(['outline', 'box'], { message: 'dam must be outline (along the mould) or box (around its bounding box)' });
export type Dam = z.infer<typeof Dam>;
export const MoldStatus = z.enum(['queued', 'analysing', 'ready', 'failed']);

/**
 * The text fields of the multipart upload (the file itself, STL, 3MF or OBJ, is the part named
 * `file`). Without `units`, a 3MF is read in the unit it states and any other file in mm.
 */
export const MoldUploadFields = z
  .object({
    units: MoldUnits.optional(),
    up: UpAxis.default('z'),
    name: text(120, 'name').optional(),
    pieceId: Id.optional(),
  })
  .strict();

export const Warning = z.object({ code: z.string(), message: z.string() });

export const DepthMap = z.object({
  originMm: z.tuple([z.number(), z.number()]),
  cellMm: z.tuple([z.number(), z.number()]),
  nx: z.number().int(),
  ny: z.number().int(),
  /** Row-major resin depth per column in mm; 0 where there is no resin. */
  depthsMm: z.array(z.number()),
});

export const CavityFill = z.object({
  levelMm: z.number(),
  dam: Dam,
  volumeMm3: z.number(),
  wettedAreaMm2: z.number(),
  maxDepthMm: z.number(),
  trappedAirMm3: z.number(),
  warnings: z.array(Warning),
  depthMap: DepthMap.optional(),
});
export type CavityFill = z.infer<typeof CavityFill>;

export const CavityReport = z.object({
  triangles: z.number().int(),
  watertight: z.boolean(),
  bboxMm: z.object({ min: z.tuple([z.number(), z.number(), z.number()]), max: z.tuple([z.number(), z.number(), z.number()]) }),
  enclosedVolumeMm3: z.number().nullable(),
  method: z.enum(['exact', 'columns']),
  estimatedErrorPct: z.number(),
  resolutionMm: z.number().nullable(),
  warnings: z.array(Warning),
  /** Volume below each level (outline dam), from the lowest to the highest point of the mould. */
  curve: z.array(z.object({ levelMm: z.number(), volumeMm3: z.number() })),
  /** The fill to the top of the mould, with its depth map. */
  fillToTop: CavityFill,
});
export type CavityReport = z.infer<typeof CavityReport>;

export const MoldView = z.object({
  id: Id,
  name: z.string(),
  fileName: z.string(),
  format: MoldFormat,
  /** The units the file's numbers were read in. */
  units: MoldFileUnits,
  /** The unit the file itself states (3MF); null for STL and OBJ, which carry none. */
  fileUnits: MoldFileUnits.nullable(),
  upAxis: UpAxis,
  sizeBytes: z.number().int(),
  sha256: z.string(),
  pieceId: Id.nullable(),
  status: MoldStatus,
  progress: z.number().describe('0..1 while the analysis runs'),
  error: z.object({ code: z.string(), message: z.string() }).nullable(),
  report: CavityReport.nullable(),
  createdAt: Timestamp,
  analysedAt: Timestamp.nullable(),
});
export type MoldView = z.infer<typeof MoldView>;

export const MoldSummary = MoldView.omit({ report: true }).extend({ fillVolumeToTopMm3: z.number().nullable() });
export const MoldList = z.object({ items: z.array(MoldSummary), total: z.number().int() });

export const MoldListQuery = z
  .object({
    pieceId: Id.optional(),
    limit: z.coerce.number().int().min(1).max(200).default(50),
    offset: z.coerce.number().int().min(0).max(1_000_000).default(0),
  })
  .strict();

export const FillQuery = z
  .object({
    level: z.coerce.number({ message: 'level must be a number (mm, in the report frame)' }).refine(Number.isFinite, { message: 'level must be a finite number' }),
    dam: Dam.default('outline'),
    depthMap: z.enum(['true', 'false']).default('false'),
  })
  .strict();

export const LayerVolumesQuery = z
  .object({
    levels: z
      .string()
      .max(4000)
      .transform((s, ctx) => {
        const nums = s.split(',').map((x) => Number(x.trim()));
        if (nums.length < 2 || nums.some((n) => !Number.isFinite(n))) {
          ctx.addIssue({ code: 'custom', message: 'levels must be at least two comma-separated numbers (mm)' });
          return z.NEVER;
        }
        return nums;
      }),
    dam: Dam.default('outline'),
  })
  .strict();

export const LayerVolumes = z.object({ dam: Dam, layers: z.array(z.object({ fromMm: z.number(), toMm: z.number(), volumeMm3: z.number() })) });
