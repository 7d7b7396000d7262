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

function flat(fromMs: number, toMs: number, tempC: number, source: CureSpanSource): HistoryPiece {
  return { fromMs, toMs, startTempC: tempC, endTempC: tempC, tempC, source };
}

/** The lowest of the given temperatures, ignoring the ones not known. */
function lowest(...temps: (number | undefined)[]): number {
  return Math.min(...temps.filter((t): t is number => t !== undefined && Number.isFinite(t)));
}

/**
 * Splits [fromMs, toMs] into history pieces. Readings are in time order (each time once). The
 * caller makes sure an assumed temperature exists where a stretch has no reading on either side.
 */
export function historyPieces(readings: TimedReading[], fromMs: number, toMs: number, carryH: number, assumedTempC: number | undefined): HistoryPiece[] {
  const carryMs = carryH * msPerHour;
  const raw: HistoryPiece[] = [];
  if (readings.length === 0) {
    raw.push(flat(fromMs, toMs, assumedTempC ?? Number.NaN, 'assumed'));
  } else {
    const first = readings[0]!;
    const last = readings[readings.length - 1]!;
    // Before the first reading: it speaks for the carry limit back, the rest is a gap.
    const leadGapEnd = first.ms - carryMs;
    raw.push(flat(-Infinity, leadGapEnd, lowest(first.tempC, assumedTempC), 'gap'));
    raw.push(flat(leadGapEnd, first.ms, first.tempC, 'carried'));
    for (let i = 0; i + 1 < readings.length; i++) {
      const a = readings[i]!;
      const b = readings[i + 1]!;
      if (b.ms - a.ms <= 2 * carryMs) {
        raw.push({ fromMs: a.ms, toMs: b.ms, startTempC: a.tempC, endTempC: b.tempC, tempC: (a.tempC + b.tempC) / 2, source: 'logged' });
      } else {
        raw.push(flat(a.ms, a.ms + carryMs, a.tempC, 'carried'));
        raw.push(flat(a.ms + carryMs, b.ms - carryMs, lowest(a.tempC, b.tempC, assumedTempC), 'gap'));
        raw.push(flat(b.ms - carryMs, b.ms, b.tempC, 'carried'));
      }
    }
    raw.push(flat(last.ms, last.ms + carryMs, last.tempC, 'carried'));
    raw.push(flat(last.ms + carryMs, Infinity, lowest(last.tempC, assumedTempC), 'gap'));
  }
  const pieces: HistoryPiece[] = [];
  for (const piece of raw) {
    const start = Math.max(piece.fromMs, fromMs);
    const end = Math.min(piece.toMs, toMs);
    if (!(end > start)) continue;
    pieces.push({ ...piece, ...clippedEnds(piece, start, end), fromMs: start, toMs: end });
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
 * The temperature to expect after asOf: the latest reading for as long as it carries, then the
 * lower of it and the assumed shop temperature (with no reading, the assumed temperature). The same
 * rule as a gap in the history, so a forecast never runs warmer than the sum would count it.
 */
export function forwardPieces(readings: TimedReading[], asOfMs: number, carryH: number, assumedTempC: number): HistoryPiece[] {
  const last = readings[readings.length - 1];
  if (!last) return [flat(asOfMs, Infinity, assumedTempC, 'assumed')];
  const carriedUntil = last.ms + carryH * msPerHour;
  const later = flat(Math.max(asOfMs, carriedUntil), Infinity, lowest(last.tempC, assumedTempC), 'gap');
  return asOfMs < carriedUntil ? [flat(asOfMs, carriedUntil, last.tempC, 'carried'), later] : [later];
}
