import { splitByShopTemperature, type ShopTemperature } from './shop-temperature';

/**
 * The temperature history a cure sum runs over, as stretches of one kind each:
 *
 * - `logged`: between two readings that are close enough to speak for the whole interval; counted
 *   at the interval's average temperature, (T1 + T2) / 2, as the maturity method of ASTM C1074 sums it.
 * - `carried`: next to a reading, up to the carry limit, where no second reading is near; counted at
 *   that reading's temperature.
 * - `gap`: further than the carry limit from any reading, though readings exist; counted at the
 *   lowest of the readings on either side and the assumed shop temperature, so a gap can only make
 *   the cure look slower than it was, never faster.
 * - `assumed`: no reading at all; counted at the assumed shop temperature.
 */
export type CureSpanSource = 'logged' | 'carried' | 'gap' | 'assumed';

export interface HistoryPiece {
  fromMs: number;
  toMs: number;
  /** Temperature at the start and the end of the stretch (equal except on logged stretches). */
  startTempC: number;
  endTempC: number;
  /** The temperature the sum uses for the stretch. */
  tempC: number;
  source: CureSpanSource;
}

export interface TimedReading {
  ms: number;
  tempC: number;
}

export const defaultReadingCarryH = 2;

const msPerHour = 3_600_000;
/** Forecasts walk the shop's day and night this far ahead, then hold its temperature there. */
const forecastHorizonMs = 180 * 24 * msPerHour;

function flat(fromMs: number, toMs: number, tempC: number, source: CureSpanSource): HistoryPiece {
  return { fromMs, toMs, startTempC: tempC, endTempC: tempC, tempC, source };
}

/** The lowest of the given temperatures, ignoring the ones not known. */
function lowest(...temps: (number | undefined)[]): number {
  return Math.min(...temps.filter((t): t is number => t !== undefined && Number.isFinite(t)));
}

/** A stretch before it is cut to the window: fixed pieces keep their temperature, open ones follow the shop. */
type Raw = { piece: HistoryPiece; ceilingC?: undefined } | { piece: HistoryPiece; ceilingC: number | undefined; followsShop: true };

/**
 * Splits [fromMs, toMs] into history pieces. Readings are in time order (each time once). Gaps and stretches without
 * any reading follow the shop's temperature (split where it changes, day to night); without one, an assumed stretch
 * has no temperature (NaN) and the caller refuses.
 */
export function historyPieces(readings: TimedReading[], fromMs: number, toMs: number, carryH: number, shop: ShopTemperature | undefined): HistoryPiece[] {
  const carryMs = carryH * msPerHour;
  const raw: Raw[] = [];
  const open = (a: number, b: number, ceilingC: number | undefined, source: CureSpanSource): Raw => ({
    piece: flat(a, b, ceilingC ?? Number.NaN, source),
    ceilingC,
    followsShop: true,
  });
  if (readings.length === 0) {
    raw.push(open(fromMs, toMs, undefined, 'assumed'));
  } else {
    const first = readings[0]!;
    const last = readings[readings.length - 1]!;
    // Before the first reading: it speaks for the carry limit back, the rest is a gap.
    const leadGapEnd = first.ms - carryMs;
    raw.push(open(-Infinity, leadGapEnd, first.tempC, 'gap'));
    raw.push({ piece: flat(leadGapEnd, first.ms, first.tempC, 'carried') });
    for (let i = 0; i + 1 < readings.length; i++) {
      const a = readings[i]!;
      const b = readings[i + 1]!;
      if (b.ms - a.ms <= 2 * carryMs) {
        raw.push({ piece: { fromMs: a.ms, toMs: b.ms, startTempC: a.tempC, endTempC: b.tempC, tempC: (a.tempC + b.tempC) / 2, source: 'logged' } });
      } else {
        raw.push({ piece: flat(a.ms, a.ms + carryMs, a.tempC, 'carried') });
        raw.push(open(a.ms + carryMs, b.ms - carryMs, lowest(a.tempC, b.tempC), 'gap'));
        raw.push({ piece: flat(b.ms - carryMs, b.ms, b.tempC, 'carried') });
      }
    }
    raw.push({ piece: flat(last.ms, last.ms + carryMs, last.tempC, 'carried') });
    raw.push(open(last.ms + carryMs, Infinity, last.tempC, 'gap'));
  }
  const pieces: HistoryPiece[] = [];
  for (const entry of raw) {
    const { piece } = entry;
    const start = Math.max(piece.fromMs, fromMs);
    const end = Math.min(piece.toMs, toMs);
    if (!(end > start)) continue;
    if ('followsShop' in entry && shop) {
      const ceiling = entry.ceilingC;
      pieces.push(...splitByShopTemperature(start, end, shop, (a, b, shopC) => flat(a, b, lowest(ceiling, shopC), piece.source)));
    } else {
      pieces.push({ ...piece, ...clippedEnds(piece, start, end), fromMs: start, toMs: end });
    }
  }
  return pieces;
}

/** A logged stretch cut by the window keeps its straight line between the two readings. */
function clippedEnds(piece: HistoryPiece, start: number, end: number): Pick<HistoryPiece, 'startTempC' | 'endTempC' | 'tempC'> {
  if (piece.source !== 'logged' || (start === piece.fromMs && end === piece.toMs)) return piece;
  const at = (ms: number) => piece.startTempC + ((piece.endTempC - piece.startTempC) * (ms - piece.fromMs)) / (piece.toMs - piece.fromMs);
  const startTempC = at(start);
  const endTempC = at(end);
  return { startTempC, endTempC, tempC: (startTempC + endTempC) / 2 };
}

/**
 * The temperature to expect after asOf: the latest reading for as long as it carries, then the shop's own pattern
 * (day and night), lowered by as much as the latest reading fell short of it, never raised. Without a reading, the
 * shop's pattern itself. So a forecast follows the night dip, and never runs warmer than the log says.
 */
export function forwardPieces(readings: TimedReading[], asOfMs: number, carryH: number, shop: ShopTemperature): HistoryPiece[] {
  const last = readings[readings.length - 1];
  if (!last) return splitByShopTemperature(asOfMs, Infinity, shop, (a, b, t) => flat(a, b, t, 'assumed'), asOfMs + forecastHorizonMs);
  const carriedUntil = last.ms + carryH * msPerHour;
  const shortfall = Math.min(0, last.tempC - shop.at(last.ms));
  const later = splitByShopTemperature(
    Math.max(asOfMs, carriedUntil),
    Infinity,
    shop,
    (a, b, t) => flat(a, b, t + shortfall, 'gap'),
    asOfMs + forecastHorizonMs,
  );
  return asOfMs < carriedUntil ? [flat(asOfMs, carriedUntil, last.tempC, 'carried'), ...later] : later;
}
