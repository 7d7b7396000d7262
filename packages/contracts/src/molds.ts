import { z } from 'zod';
import { Id, Timestamp, requiredText, text } from './common';

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
 * Which datum a level is measured from. `floor`: the height of the resin surface above the cavity floor, the
 * lowest point where resin stands with the chosen dam (the same meaning as a quick shape's depth). `mould`: a
 * height in the mould file's own frame, after its units and up axis, as a CAD program shows it.
 */
export const LevelFrom = z
  .enum(['floor', 'mould'], { message: "from must be floor (height above the cavity floor) or mould (the mould file's own frame)" })
  .describe("floor: height of the resin surface above the cavity floor (where the deepest resin stands); mould: height in the mould file's own frame");
export type LevelFrom = z.infer<typeof LevelFrom>;

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

/** A fill as the cavity report stores it: levels in the mould's own frame. */
export const CavityFill = z.object({
  levelMm: z.number().describe("the level in the mould's own frame (mm)"),
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
  /** Volume below each level (outline dam), from the lowest to the highest point of the mould, levels in its own frame. */
  curve: z.array(z.object({ levelMm: z.number(), volumeMm3: z.number() })),
  /** The fill to the top of the mould; its depth map is a resource of its own (GET /api/molds/:id/depth-map). */
  fillToTop: CavityFill.omit({ depthMap: true }),
  floorMm: z
    .object({ outline: z.number(), box: z.number() })
    .describe(
      "the cavity floor with each dam, as a height in the mould's own frame (mm): a level from the floor plus this is the same level in the mould's frame",
    ),
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

/** The depth map of the report's fill to the top: resin thickness per column with the report's dam, level in the mould's frame. */
export const MoldDepthMap = DepthMap.extend({
  levelMm: z.number().describe("the level the map was measured at, in the mould's own frame (mm)"),
  dam: Dam,
});
export type MoldDepthMap = z.infer<typeof MoldDepthMap>;

/** What the analysis events stream (GET /api/molds/:id/events) carries in each `progress`, `ready` or `failed` event. */
export const MoldProgressEvent = z.object({
  status: MoldStatus,
  progress: z.number().describe('0..1'),
  error: z.object({ code: z.string(), message: z.string() }).nullable(),
});
export type MoldProgressEvent = z.infer<typeof MoldProgressEvent>;

export const UpdateMoldRequest = z
  .object({
    name: requiredText(120, 'name'),
    pieceId: Id.nullable().describe('the piece the mould belongs to; null detaches it'),
    units: MoldFileUnits.describe('the unit the file was drawn in; a change reads the stored file again'),
    upAxis: UpAxis.describe('the file axis that points up; a change reads the stored file again'),
  })
  .partial()
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: 'send at least one of name, pieceId, units, upAxis' });
export type UpdateMoldRequest = z.infer<typeof UpdateMoldRequest>;

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
    level: z.coerce
      .number({ message: 'level must be a number (mm above the cavity floor, or in the mould frame with from=mould)' })
      .refine(Number.isFinite, { message: 'level must be a finite number' })
      .describe('mm: height of the resin surface above the cavity floor, or in the mould frame with from=mould'),
    from: LevelFrom.default('floor'),
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
      })
      .describe('mm, ascending, measured as `from` says'),
    from: LevelFrom.default('floor'),
    dam: Dam.default('outline'),
  })
  .strict();

/** Where a level answer stands in both frames, so a screen can show either. */
const LevelFrames = {
  levelFrom: LevelFrom,
  floorMm: z.number().describe("the cavity floor with this dam, as a height in the mould's own frame (mm)"),
};

/** The fill route's answer: the stored fill's fields, with the level in the frame asked for and both readings of it. */
export const MoldFill = CavityFill.extend({
  levelMm: z.number().describe('the level as asked, in the frame levelFrom names (mm)'),
  ...LevelFrames,
  levelAboveFloorMm: z.number().describe('height of the resin surface above the cavity floor (mm)'),
  levelInMouldMm: z.number().describe("the same surface as a height in the mould's own frame (mm)"),
});
export type MoldFill = z.infer<typeof MoldFill>;

export const LayerVolumes = z.object({
  dam: Dam,
  ...LevelFrames,
  layers: z.array(z.object({ fromMm: z.number(), toMm: z.number(), volumeMm3: z.number() }).describe('levels in the frame levelFrom names')),
});
