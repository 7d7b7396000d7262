import { z } from 'zod';
import { Id, Timestamp, UserRef, instant, requiredText, text } from './common';
import { Warning } from './molds';

const grams = (label: string) =>
  z
    .number({ message: `${label} must be a number (g)` })
    .min(0, { message: `${label} cannot be negative` })
    .max(1_000_000, { message: `${label} is implausibly large` });
const temp = (label: string) =>
  z
    .number({ message: `${label} must be a number (°C)` })
    .min(-30, { message: `${label} must be at least −30 °C` })
    .max(80, { message: `${label} must be at most 80 °C` });
const lotNumber = text(80, 'lot number');

export const PourStatus = z.enum(['open', 'released', 'machined', 'cancelled']);
export const CureCheckStage = z.enum(['liquid', 'gelled', 'tack_free', 'demoldable', 'machinable'], {
  message: 'stage must be liquid, gelled, tack_free, demoldable or machinable',
});
export const ReminderKind = z.enum([
  'seal_coat_window_opens',
  'seal_coat_window_closes',
  'next_layer_window_opens',
  'next_layer_window_closes',
  'demold_check',
  'ready_to_machine',
  'finish_coat_due',
  'piece_released',
  'piece_machined',
]);

/** Set on a request to log a value the log questions (far out of range, far from its target, a layer poured early). */
const confirmUnusual = z
  .boolean({ message: 'confirmUnusual must be true or false' })
  .default(false)
  .describe('the person has seen the question about an unusual value and logs it anyway');

export const StartPourRequest = z.object({ pourPlanId: Id, notifyUserIds: z.array(Id).max(20).optional() }).strict();

export const LogBatchRequest = z
  .object({
    planBatchIndex: z.number().int().min(0).max(10_000),
    mixedAt: instant('mixedAt').optional(),
    lotAId: Id.nullable().default(null),
    lotBId: Id.nullable().default(null),
    lotPigmentId: Id.nullable().default(null),
    lotANumber: lotNumber.default(''),
    lotBNumber: lotNumber.default(''),
    lotPigmentNumber: lotNumber.default(''),
    weighedAG: grams('weighed part A').refine((g) => g > 0, { message: 'weighed part A must be above zero' }),
    weighedBG: grams('weighed part B').refine((g) => g > 0, { message: 'weighed part B must be above zero' }),
    weighedPigmentG: grams('weighed pigment').optional().describe('required when the cup has pigment'),
    ambientTempC: temp('ambient temperature').nullable().default(null),
    surfaceTempC: temp('surface temperature').nullable().default(null),
    rhPct: z.number().min(0).max(100, { message: 'relative humidity must be 0–100 %' }).nullable().default(null),
    notes: text(2000, 'notes').default(''),
    /** An expired lot is allowed only once the person mixing says they know. */
    acknowledgeExpiredLot: z.boolean().default(false),
    confirmUnusual,
  })
  .strict();
export type LogBatchRequest = z.input<typeof LogBatchRequest>;

export const BatchView = z.object({
  id: Id,
  planBatchIndex: z.number().int(),
  step: z.string(),
  mixedBy: UserRef.nullable(),
  mixedAt: Timestamp,
  lotA: z.string(),
  lotB: z.string(),
  lotPigment: z.string(),
  targetAG: z.number(),
  targetBG: z.number(),
  targetPigmentG: z.number(),
  weighedAG: z.number(),
  weighedBG: z.number(),
  weighedPigmentG: z.number(),
  offRatioPct: z.number(),
  ambientTempC: z.number().nullable(),
  surfaceTempC: z.number().nullable(),
  rhPct: z.number().nullable(),
  dewPointC: z.number().nullable(),
  warnings: z.array(Warning),
  notes: z.string(),
  voided: z
    .object({ at: Timestamp, by: UserRef.nullable(), reason: z.string() })
    .nullable()
    .describe('a voided cup stays in the history, out of the cure and the stock'),
});
export type BatchView = z.infer<typeof BatchView>;

export const ReadingInput = z.object({ at: instant('at'), tempC: temp('temperature') });
export const AddReadingsRequest = z.object({ readings: z.array(ReadingInput).min(1).max(10_000), confirmUnusual }).strict();
export const IngestReadingsRequest = z.object({ pourId: Id, readings: z.array(ReadingInput).min(1).max(10_000), confirmUnusual }).strict();
export const ReadingsAdded = z.object({
  added: z.number().int(),
  duplicates: z.number().int().describe('readings already logged with the same time and temperature'),
  unit: z.enum(['C', 'F']).optional().describe('the unit of an imported file’s temperature column; °F is converted'),
});
export const CsvImportQuery = z.object({ confirmUnusual: z.enum(['true', 'false']).default('false') }).strict();

export const ReadingView = z.object({
  id: Id,
  at: Timestamp,
  tempC: z.number(),
  source: z.enum(['manual', 'csv', 'sensor']),
  loggedBy: UserRef.nullable().describe('null for the shop thermometer'),
  loggedAt: Timestamp,
  voided: z.object({ at: Timestamp, by: UserRef.nullable(), reason: z.string() }).nullable(),
});
export type ReadingView = z.infer<typeof ReadingView>;
export const ReadingList = z.object({ items: z.array(ReadingView) });
export const VoidRequest = z.object({ reason: requiredText(500, 'reason') }).strict();
export const ReadingParams = z.object({ id: Id, readingId: Id });
export const BatchParams = z.object({ id: Id, batchId: Id });

export const StageTimingView = z.object({
  key: z.string(),
  equivalentHoursAtRef: z.number(),
  reached: z.boolean(),
  reachedAt: z.string().nullable(),
  predictedAt: z.string().nullable(),
});

export const CureView = z.object({
  /** The step the cure clock runs from: the latest seal coat or layer poured. */
  step: z.string().nullable(),
  productName: z.string().nullable(),
  pouredAt: Timestamp.nullable(),
  equivalentHoursAtRef: z.number(),
  progress: z.number().describe('0..1 of full cure'),
  stageReached: z.string().nullable(),
  nextLayerWindow: z.enum(['not_open', 'open', 'closed']).nullable(),
  assumedHours: z.number().describe('wall-clock hours no reading speaks for (gaps, and stretches with no reading at all)'),
  belowMinimumHours: z.number().describe('wall-clock hours below the product’s minimum temperature: counted slowly, not promised by the data sheet'),
  loggedEquivalentHours: z.number().describe('equivalent hours at the reference temperature that the readings themselves show'),
  assumedEquivalentHours: z.number().describe('equivalent hours counted on gaps and unlogged stretches, each at its conservative temperature'),
  readingCarryH: z.number(),
  gaps: z
    .array(z.object({ from: Timestamp, to: Timestamp, hours: z.number(), tempC: z.number() }))
    .describe('stretches more than the carry limit from any reading'),
  spans: z
    .array(
      z.object({
        from: Timestamp,
        to: Timestamp,
        source: z.enum(['logged', 'carried', 'gap', 'assumed']),
        tempC: z.number(),
        startTempC: z.number(),
        endTempC: z.number(),
        belowMinimum: z.boolean(),
      }),
    )
    .describe('the history the cure sum ran over'),
  ahead: z
    .array(z.object({ from: Timestamp, to: Timestamp, tempC: z.number() }))
    .describe("the temperatures the forecast runs on from now until the last stage ahead (the shop's day and night, or what it learned)"),
  readyToMachine: z.boolean().describe('the logged cure (gaps counted conservatively) has reached the data sheet’s point'),
  release: z
    .object({ allowed: z.boolean(), reasons: z.array(z.string()).describe('what still stands in the way, in words') })
    .describe('whether a lead may release the piece for machining now, and why not'),
  stages: z.array(StageTimingView),
  cautions: z.array(z.object({ code: z.string(), severity: z.string(), message: z.string() })),
});

export const ReminderView = z.object({
  id: Id,
  kind: ReminderKind,
  /** Done: its step was logged (a layer poured, a check, a release), or a member marked it. */
  done: z.object({ at: Timestamp, by: UserRef.nullable(), how: z.enum(['logged', 'marked']) }).nullable(),
  step: z.string(),
  dueAt: Timestamp.describe('when the reminder goes out'),
  eventAt: Timestamp.describe('the moment of the step it announces'),
  leadMin: z.number().int().describe('minutes between the reminder and its step (closing windows)'),
  viaDigest: z.boolean().describe("due in the shop's quiet hours: it goes out with the morning digest, not on its own"),
  status: z.enum(['pending', 'sent', 'cancelled']),
  assumed: z.boolean(),
  title: z.string(),
  sentAt: Timestamp.nullable(),
});
export type ReminderView = z.infer<typeof ReminderView>;

export const CureCheckView = z.object({
  id: Id,
  checkedAt: Timestamp,
  stage: CureCheckStage,
  hardnessShoreD: z.number().nullable(),
  note: z.string(),
  hasPhoto: z.boolean(),
  checkedBy: UserRef.nullable(),
});
export const CureCheckFields = z
  .object({
    stage: CureCheckStage,
    checkedAt: instant('checkedAt').optional(),
    hardnessShoreD: z.coerce.number().min(0).max(100, { message: 'Shore D hardness runs 0–100' }).optional(),
    note: text(2000, 'note').default(''),
  })
  .strict();

export const PourSummary = z.object({
  id: Id,
  piece: z.object({ id: Id, name: z.string(), stage: z.string() }),
  planName: z.string(),
  status: PourStatus,
  startedAt: Timestamp,
  batchesLogged: z.number().int(),
  batchesPlanned: z.number().int(),
  cure: CureView,
  nextReminder: ReminderView.nullable(),
  flags: z
    .array(z.object({ code: z.enum(['off_ratio', 'expired_lot', 'dew_point', 'voided']), count: z.number().int(), message: z.string() }))
    .describe('what about this pour’s log needs a look: off-ratio cups, expired lots, dew-point breaches, voided entries'),
});
export type PourSummary = z.infer<typeof PourSummary>;

export const PourView = PourSummary.extend({
  pourPlanId: Id,
  assumedTempC: z.number(),
  notify: z.array(UserRef),
  batches: z.array(BatchView).describe('the cups as logged; voided ones are in voidedBatches'),
  voidedBatches: z.array(BatchView),
  readings: z.array(ReadingView).describe('the readings the cure counts; voided ones are in voidedReadings'),
  voidedReadings: z.array(ReadingView),
  checks: z.array(CureCheckView),
  reminders: z.array(ReminderView),
  releasedAt: Timestamp.nullable(),
  releasedBy: UserRef.nullable(),
  machinedAt: Timestamp.nullable(),
});
export type PourView = z.infer<typeof PourView>;

export const PourListQuery = z
  .object({
    status: z.enum(['active', 'released', 'machined', 'all']).default('active'),
    readyToday: z.enum(['true', 'false']).default('false'),
    pieceId: Id.optional(),
    pourPlanId: Id.optional().describe('only the pours of this plan (a printed run sheet links to its pour)'),
    limit: z.coerce.number().int().min(1).max(200).default(50),
    offset: z.coerce.number().int().min(0).max(1_000_000).default(0),
  })
  .strict();
export const PourList = z.object({ items: z.array(PourSummary), total: z.number().int() });

export const MachinedRequest = z
  .object({
    machinedAt: instant('machinedAt').optional(),
    finishCoats: z.number().int().min(0).max(20),
    hoursBetweenCoats: z
      .number()
      .positive()
      .max(24 * 30),
  })
  .strict();

export const TodayView = z.object({
  due: z.array(ReminderView.extend({ pourId: Id, pieceName: z.string() })).describe('reminders due in the next 24 hours or overdue'),
  openPours: z.number().int(),
});

export const IngestToken = z.object({ token: z.string().describe('shown once: give it to the shop thermometer as X-Gelpoint-Ingest-Token') });
export type IngestToken = z.infer<typeof IngestToken>;
