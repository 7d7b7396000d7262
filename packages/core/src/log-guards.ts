import { convertTemperature } from './units';

/**
 * The checks a log makes before it believes what it is told. Two kinds:
 * - refusals: a time the log cannot hold (in the future, before the pour);
 * - questions: a value that is possible but unusual (a reading far outside the product's range, a
 *   cup far from its target, a layer poured before the one below is ready). The person confirms it,
 *   or corrects it.
 */
export interface LogConcern {
  code: 'reading_out_of_range' | 'reading_looks_fahrenheit' | 'weight_far_from_target' | 'layer_window_not_open';
  /** The request field it is about. */
  field: string;
  message: string;
  /** For a value that looks like °F typed as °C: the same value in °C. */
  suggestedTempC?: number;
}

/** How far beyond the product's working range a reading still passes without a question. */
export const plausibleMarginK = 10;
/**
 * A reading may be timed at most this far ahead of the server's clock, or before the pour started: clocks drift, and a
 * time typed to the minute falls up to a minute before the moment it names.
 */
export const futureToleranceMs = 10 * 60_000;
/** A weighed part further than this from its target, as a share of the target, is questioned. */
export const weightQuestionShare = 0.5;

export interface PlausibleRange {
  minC: number;
  maxC: number;
}

/** The product's working range widened by the margin: what a logged temperature is expected to fall in. */
export function plausibleRange(product: { minWorkTempC: number; maxWorkTempC: number }): PlausibleRange {
  return { minC: product.minWorkTempC - plausibleMarginK, maxC: product.maxWorkTempC + plausibleMarginK };
}

function fmt(x: number): string {
  return String(Math.round(x * 10) / 10);
}

/** Questions about one logged temperature (°C) against the plausible range of its pour. */
export function temperatureConcerns(tempC: number, range: PlausibleRange, field = 'tempC'): LogConcern[] {
  if (tempC >= range.minC && tempC <= range.maxC) return [];
  const asF = convertTemperature(tempC, 'F', 'C');
  if (asF >= range.minC && asF <= range.maxC) {
    return [
      {
        code: 'reading_looks_fahrenheit',
        field,
        message: `${fmt(tempC)} °C is outside what this pour expects (${fmt(range.minC)} to ${fmt(range.maxC)} °C), but ${fmt(tempC)} °F is ${fmt(asF)} °C: did you mean °F? Enter it in °C, or confirm ${fmt(tempC)} °C if that is what the thermometer read.`,
        suggestedTempC: Math.round(asF * 10) / 10,
      },
    ];
  }
  return [
    {
      code: 'reading_out_of_range',
      field,
      message: `${fmt(tempC)} °C is outside what this pour expects: ${fmt(range.minC)} to ${fmt(range.maxC)} °C (the product's working range widened by ${plausibleMarginK} K). Check the thermometer and the unit, or confirm the reading if it is right.`,
    },
  ];
}

/** Why a reading's time cannot be logged at all, or null when it can. */
export function readingTimeRefusal(atMs: number, { pourStartedMs, nowMs }: { pourStartedMs: number; nowMs: number }): string | null {
  if (atMs > nowMs + futureToleranceMs) {
    return `${new Date(atMs).toISOString()} is in the future; a reading can be timed at most ${futureToleranceMs / 60_000} minutes ahead of now (check the logger's clock and time zone).`;
  }
  if (atMs < pourStartedMs - futureToleranceMs) {
    return `${new Date(atMs).toISOString()} is before this pour started (${new Date(pourStartedMs).toISOString()}); log only readings taken since.`;
  }
  return null;
}

export interface WeighedPart {
  field: string;
  label: string;
  weighedG: number;
  targetG: number;
}

/** Questions about weighed parts far from their targets (more than half the target away). */
export function weightConcerns(parts: WeighedPart[]): LogConcern[] {
  const out: LogConcern[] = [];
  for (const part of parts) {
    if (!(part.targetG > 0)) continue;
    const share = part.weighedG / part.targetG - 1;
    if (Math.abs(share) > weightQuestionShare) {
      out.push({
        code: 'weight_far_from_target',
        field: part.field,
        message: `${part.label} weighed ${fmt(part.weighedG)} g against a target of ${fmt(part.targetG)} g (${share > 0 ? '+' : ''}${fmt(share * 100)} %). Check the scale and the number typed; confirm it if the cup really holds that much.`,
      });
    }
  }
  return out;
}
