import { hoursAtTemperature, rateFactor } from './arrhenius';
import { caution, type Caution } from './cautions';
import type { CureReading } from './cure-readings';
import { forwardPieces } from './cure-history';
import { equivalentAge, readTimedReadings, type CureSpan, type EquivalentAge } from './equivalent-age';
import { potLifeMinAt } from './pot-life';
import { checkZone, formatIsoInstant, msPerHour, parseIsoInstant } from './iso-time';
import { shopTemperatureOf, type AssumedTemperature } from './shop-temperature';
import { fail, ok, type Result } from './result';
import { activationEnergyOf, readyToMachineHOf, type ResinSystem } from './shelf';

export type CureStageKey = 'gel' | 'next_layer_opens' | 'tack_free' | 'next_layer_closes' | 'demold' | 'full_cure' | 'ready_to_machine';

export interface CureStage {
  key: CureStageKey;
  /** Data-sheet time, i.e. hours of cure at the reference temperature. */
  equivalentHoursAtRef: number;
}

type CureTimes = Pick<ResinSystem, 'gelTimeH' | 'recoatWindow' | 'tackFreeH' | 'demoldH' | 'fullCureH' | 'readyToMachineH'>;

/** The milestones of one pour in the order the cure reaches them. */
export function cureStages(product: CureTimes): CureStage[] {
  const stages: CureStage[] = [
    { key: 'gel', equivalentHoursAtRef: product.gelTimeH },
    { key: 'next_layer_opens', equivalentHoursAtRef: product.recoatWindow.earliestH },
    { key: 'tack_free', equivalentHoursAtRef: product.tackFreeH },
    { key: 'next_layer_closes', equivalentHoursAtRef: product.recoatWindow.latestH },
    { key: 'demold', equivalentHoursAtRef: product.demoldH },
    { key: 'full_cure', equivalentHoursAtRef: product.fullCureH },
    { key: 'ready_to_machine', equivalentHoursAtRef: readyToMachineHOf(product) },
  ];
  // Stable sort keeps the listed order for stages a data sheet gives the same time.
  return stages.sort((p, q) => p.equivalentHoursAtRef - q.equivalentHoursAtRef);
}

/** Share of full cure, 0..1. */
export function cureProgress(equivalentHoursAtRef: number, product: Pick<ResinSystem, 'fullCureH'>): number {
  return Math.min(1, Math.max(0, equivalentHoursAtRef / product.fullCureH));
}

/** The last stage the cure has reached, or null before gel. */
export function stageReached(equivalentHoursAtRef: number, product: CureTimes): CureStageKey | null {
  let reached: CureStageKey | null = null;
  for (const stage of cureStages(product)) if (equivalentHoursAtRef >= stage.equivalentHoursAtRef) reached = stage.key;
  return reached;
}

export type NextLayerWindowState = 'not_open' | 'open' | 'closed';

/** Closed means the layer has gone past its recoat window and needs sanding before the next pour. */
export function nextLayerWindow(equivalentHoursAtRef: number, product: Pick<ResinSystem, 'recoatWindow'>): NextLayerWindowState {
  if (equivalentHoursAtRef < product.recoatWindow.earliestH) return 'not_open';
  return equivalentHoursAtRef <= product.recoatWindow.latestH ? 'open' : 'closed';
}

export interface TimesAtTemperature {
  tempC: number;
  /** k(T)/k(Tref): above 1 cures faster than the data sheet. */
  rateFactor: number;
  /**
   * Below the product's minimum temperature: the times below still follow the Arrhenius rate (the
   * cure goes on, slowly), but the data sheet promises nothing there.
   */
  belowMinimum: boolean;
  potLifeMin: number;
  gelTimeH: number;
  nextLayerOpensH: number;
  nextLayerClosesH: number;
  tackFreeH: number;
  demoldH: number;
  fullCureH: number;
  readyToMachineH: number;
}

/** The data sheet's times scaled for one steady temperature (Arrhenius). */
export function timesAtTemperature(product: ResinSystem, tempC: number): TimesAtTemperature {
  const ea = activationEnergyOf(product);
  const at = (hours: number) => hoursAtTemperature(hours, tempC, product.referenceTempC, ea);
  return {
    tempC,
    rateFactor: rateFactor(tempC, product.referenceTempC, ea),
    belowMinimum: tempC < product.minWorkTempC,
    potLifeMin: potLifeMinAt(product, tempC),
    gelTimeH: at(product.gelTimeH),
    nextLayerOpensH: at(product.recoatWindow.earliestH),
    nextLayerClosesH: at(product.recoatWindow.latestH),
    tackFreeH: at(product.tackFreeH),
    demoldH: at(product.demoldH),
    fullCureH: at(product.fullCureH),
    readyToMachineH: at(readyToMachineHOf(product)),
  };
}

export interface StageTiming {
  key: CureStageKey;
  equivalentHoursAtRef: number;
  reached: boolean;
  /** When the logged history reached it (only when the spans that reached it are known). */
  reachedAt: string | null;
  /** For stages still ahead: when the forecast temperatures reach it. */
  predictedAt: string | null;
}

/** A stretch of forecast temperature: from fromMs on (until toMs, which may be Infinity). */
export interface ForecastPiece {
  fromMs: number;
  toMs: number;
  tempC: number;
}

export interface StagePredictionInput {
  product: ResinSystem;
  equivalentHoursAtRef: number;
  /** The moment the equivalent age was taken. */
  asOf: string;
  /** The temperature expected from asOf on, when `ahead` is not given. */
  assumedTempC?: number;
  /** The temperatures expected from asOf on, in time order; the last should run to Infinity. */
  ahead?: ForecastPiece[];
  zone?: string;
}

/** Epoch ms at which `needed` more equivalent hours are gained over the pieces, or null if they end first. */
function whenGained(pieces: ForecastPiece[], needed: number, rateAt: (tempC: number) => number): number | null {
  let gained = 0;
  for (const piece of pieces) {
    const rate = rateAt(piece.tempC);
    const wallH = (piece.toMs - piece.fromMs) / msPerHour;
    if (rate > 0 && gained + rate * wallH >= needed) return piece.fromMs + ((needed - gained) / rate) * msPerHour;
    gained += rate * wallH;
  }
  return null;
}

/** When each stage still ahead will be reached at the forecast temperatures from asOf on. */
export function predictStages(input: StagePredictionInput): Result<StageTiming[]> {
  const asOf = parseIsoInstant(input.asOf);
  if (!asOf.ok) return fail(asOf.error.code, `The time to predict from: ${asOf.error.message}`);
  const zone = checkZone(input.zone ?? 'utc');
  if (!zone.ok) return zone;
  const ahead = input.ahead ?? [{ fromMs: asOf.value, toMs: Infinity, tempC: input.assumedTempC ?? Number.NaN }];
  const bad = ahead.find((p) => !(Number.isFinite(p.tempC) && p.tempC > -273.15));
  if (bad) return fail('temperature_invalid', `The assumed temperature must be a number in °C above absolute zero, got ${String(bad.tempC)}.`);
  const { product } = input;
  const ea = activationEnergyOf(product);
  const rateAt = (tempC: number) => rateFactor(tempC, product.referenceTempC, ea);
  return ok(
    cureStages(product).map((stage) => {
      const remaining = stage.equivalentHoursAtRef - input.equivalentHoursAtRef;
      const reached = remaining <= 0;
      const at = reached ? null : whenGained(ahead, remaining, rateAt);
      return {
        key: stage.key,
        equivalentHoursAtRef: stage.equivalentHoursAtRef,
        reached,
        reachedAt: null,
        predictedAt: at === null || !Number.isFinite(at) ? null : formatIsoInstant(Math.round(at), zone.value),
      };
    }),
  );
}

function whenReached(spans: CureSpan[], equivalentHoursAtRef: number): number | null {
  let gained = 0;
  for (const span of spans) {
    if (span.rate > 0 && gained + span.equivalentHoursAtRef >= equivalentHoursAtRef) {
      return span.fromMs + ((equivalentHoursAtRef - gained) / span.rate) * msPerHour;
    }
    gained += span.equivalentHoursAtRef;
  }
  return null;
}

export interface CureStatusInput {
  product: ResinSystem;
  readings: CureReading[];
  /** When the layer was poured. */
  pouredAt: string;
  /** Now, or the moment to look at. */
  asOf: string;
  /** The plan's shop temperature (or the shop's day and night): counted where no reading exists, never exceeded in a gap or a forecast. */
  assumedTempC: AssumedTemperature;
  /** How long a reading speaks for on either side of it, in hours (default 2). */
  readingCarryH?: number;
  zone?: string;
}

export interface CureStatus {
  age: EquivalentAge;
  progress: number;
  stageReached: CureStageKey | null;
  nextLayerWindow: NextLayerWindowState;
  stages: StageTiming[];
  /** The temperatures the forecast of the stages ahead runs on, from asOf on. */
  ahead: ForecastPiece[];
  cautions: Caution[];
}

/**
 * Where one pour stands: from the pour to asOf on the logged history, then forward from the latest
 * reading (never warmer than the plan's shop temperature once that reading stops speaking).
 */
export function cureStatus(input: CureStatusInput): Result<CureStatus> {
  const { product } = input;
  const zoneArg = input.zone === undefined ? {} : { zone: input.zone };
  const age = equivalentAge({
    readings: input.readings,
    refTempC: product.referenceTempC,
    activationEnergyKJPerMol: activationEnergyOf(product),
    minTempC: product.minWorkTempC,
    window: { from: input.pouredAt, to: input.asOf },
    assumedTempC: input.assumedTempC,
    ...(input.readingCarryH === undefined ? {} : { readingCarryH: input.readingCarryH }),
    ...zoneArg,
  });
  if (!age.ok) return age;
  const timed = readTimedReadings(input.readings);
  const asOfMs = parseIsoInstant(input.asOf);
  if (!timed.ok) return timed;
  if (!asOfMs.ok) return asOfMs;
  const upToNow = timed.value.filter((r) => r.ms <= asOfMs.value);
  const ahead = forwardPieces(upToNow, asOfMs.value, age.value.readingCarryH, shopTemperatureOf(input.assumedTempC)).map(({ fromMs, toMs, tempC }) => ({
    fromMs,
    toMs,
    tempC,
  }));
  const te = age.value.equivalentHoursAtRef;
  const predicted = predictStages({ product, equivalentHoursAtRef: te, asOf: input.asOf, ahead, ...zoneArg });
  if (!predicted.ok) return predicted;
  const stages = predicted.value.map((stage) => {
    if (!stage.reached) return stage;
    const at = whenReached(age.value.spans, stage.equivalentHoursAtRef);
    return { ...stage, reachedAt: at === null ? null : formatIsoInstant(Math.round(at), input.zone ?? 'utc') };
  });
  const cautions = [...age.value.cautions];
  const windowState = nextLayerWindow(te, product);
  if (windowState === 'closed') {
    cautions.push(
      caution(
        'next_layer_window_closed',
        'warning',
        `The recoat window of "${product.name}" has closed; sand the surface (and clean off any blush) before pouring the next layer, as the TDS describes.`,
        'layer',
      ),
    );
  }
  const coldAhead = ahead.find((p) => p.tempC < product.minWorkTempC);
  if (coldAhead) {
    cautions.push(
      caution(
        'cure_slow_ahead',
        'warning',
        `The forecast runs at ${round1(coldAhead.tempC)} °C, below the product's minimum of ${product.minWorkTempC} °C: the cure goes on only slowly there, and the data sheet does not promise it will finish. Warm the piece; the times ahead assume the cold holds.`,
        'plan',
      ),
    );
  }
  return ok({
    age: age.value,
    progress: cureProgress(te, product),
    stageReached: stageReached(te, product),
    nextLayerWindow: windowState,
    stages,
    ahead,
    cautions,
  });
}

function round1(x: number): number {
  return Math.round(x * 10) / 10;
}
