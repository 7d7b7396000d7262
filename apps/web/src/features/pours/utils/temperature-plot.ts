import { activationEnergyOf, equivalentAge, parseIsoInstant, unitSystemUnits, type CureReading, type CureSpanSource, type UnitSystem } from '@gelpoint/core';
import { hourMs } from './relative-time';
import { temperatureFromC } from './shop-units';

export interface PlotFrame {
  width: number;
  height: number;
  left: number;
  right: number;
  top: number;
  bottom: number;
}

export const defaultPlotFrame: PlotFrame = { width: 640, height: 240, left: 48, right: 16, top: 16, bottom: 36 };

export interface PlotSpan {
  /** logged: a straight line between two readings; carried: one reading held; gap / assumed: no reading near. */
  source: CureSpanSource;
  /** Below the product's minimum: counted slowly, and not promised by the data sheet. */
  belowMinimum: boolean;
  from: string;
  to: string;
  x1: number;
  x2: number;
  /** Heights at the span's two ends (equal unless the span is logged). */
  y1: number;
  y2: number;
  /** The temperature the cure sum counts for the span, in the shop's unit. */
  temp: number;
}

export interface TemperaturePlot {
  frame: PlotFrame;
  unit: '°C' | '°F';
  fromMs: number;
  toMs: number;
  spans: PlotSpan[];
  dots: { x: number; y: number; at: string; temp: number }[];
  minimum: { y: number; temp: number };
  /** Where the cure clock starts, when a cup has been logged. */
  pouredX: number | null;
  /** The forecast ahead, a step per stretch of the shop's assumed temperature (its night dip shows here). */
  forecast: { from: string; to: string; x1: number; x2: number; y: number; temp: number }[];
  /** Where now is, when a forecast follows it. */
  nowX: number | null;
  yTicks: { y: number; value: number }[];
}

/** A stretch of the history as the server's cure sum ran it (the shop's own profile in the unlogged parts). */
export interface HistorySpan {
  from: string;
  to: string;
  source: CureSpanSource;
  tempC: number;
  startTempC: number;
  endTempC: number;
  belowMinimum: boolean;
}

export interface TemperaturePlotInput {
  readings: readonly CureReading[];
  /** When the cure clock started; null before the first batch is logged. */
  pouredAt: string | null;
  asOf: string;
  assumedTempC: number;
  /** How long a reading speaks for on either side of it (the shop's setting). */
  readingCarryH: number;
  product: { referenceTempC: number; minWorkTempC: number; activationEnergyKJPerMol?: number | undefined };
  unitSystem: UnitSystem;
  frame?: PlotFrame;
  /** The history as the server counted it; without it the plot works it out at the constant assumedTempC. */
  history?: readonly HistorySpan[];
  /** The temperatures the forecast runs on from now on. */
  ahead?: readonly { from: string; to: string; tempC: number }[];
}

const toMs = (iso: string) => {
  const parsed = parseIsoInstant(iso);
  return parsed.ok ? parsed.value : Number.NaN;
};

/**
 * The cure log's temperature plot: straight lines between readings, readings carried across short stretches, and the
 * gaps and unlogged stretches at the temperature core counted them at, exactly as core's equivalent-age sum runs.
 * Coordinates are SVG user units.
 */
export function temperaturePlot(input: TemperaturePlotInput): TemperaturePlot | null {
  const frame = input.frame ?? defaultPlotFrame;
  const readings = input.readings.filter((r) => Number.isFinite(toMs(r.at))).sort((p, q) => toMs(p.at) - toMs(q.at));
  if (readings.length === 0 && input.pouredAt === null) return null;

  const ea = activationEnergyOf({
    referenceTempC: input.product.referenceTempC,
    ...(input.product.activationEnergyKJPerMol === undefined ? {} : { activationEnergyKJPerMol: input.product.activationEnergyKJPerMol }),
  });
  const asOfMs = toMs(input.asOf);
  const pouredMs = input.pouredAt === null ? Number.NaN : toMs(input.pouredAt);
  // A page's clock can lag the server's by a moment: a pour logged "after now" still counts from its own time.
  const untilIso = asOfMs >= pouredMs ? input.asOf : input.pouredAt!;
  const age = Number.isFinite(pouredMs)
    ? equivalentAge({
        readings: [...readings],
        refTempC: input.product.referenceTempC,
        activationEnergyKJPerMol: ea,
        minTempC: input.product.minWorkTempC,
        window: { from: input.pouredAt!, to: untilIso },
        assumedTempC: input.assumedTempC,
        readingCarryH: input.readingCarryH,
      })
    : readings.length > 1
      ? equivalentAge({
          readings: [...readings],
          refTempC: input.product.referenceTempC,
          activationEnergyKJPerMol: ea,
          minTempC: input.product.minWorkTempC,
          readingCarryH: input.readingCarryH,
        })
      : null;
  const coreSpans = input.history
    ? input.history
        .map((h) => ({ ...h, fromMs: toMs(h.from), toMs: Math.min(toMs(h.to), asOfMs) }))
        .filter((h) => Number.isFinite(h.fromMs) && h.toMs > h.fromMs)
    : age?.ok
      ? age.value.spans
      : [];
  const ahead = (input.ahead ?? []).map((p) => ({ ...p, fromMs: toMs(p.from), toMs: toMs(p.to) })).filter((p) => p.toMs > p.fromMs);

  const times = [...readings.map((r) => toMs(r.at)), ...coreSpans.flatMap((s) => [s.fromMs, s.toMs]), ...ahead.flatMap((p) => [p.fromMs, p.toMs])];
  if (Number.isFinite(pouredMs)) times.push(pouredMs);
  let fromMs = Math.min(...times);
  let untilMs = Math.max(...times);
  if (!(untilMs > fromMs)) {
    fromMs -= hourMs / 2;
    untilMs += hourMs / 2;
  }

  const shown = (tempC: number) => temperatureFromC(tempC, input.unitSystem);
  const temps = [
    ...readings.map((r) => shown(r.tempC)),
    ...coreSpans.flatMap((s) => [shown(s.startTempC), shown(s.endTempC)]),
    ...ahead.map((p) => shown(p.tempC)),
    shown(input.product.minWorkTempC),
  ];
  const step = input.unitSystem === 'us' ? 10 : 5;
  let low = Math.floor(Math.min(...temps) / step) * step;
  let high = Math.ceil(Math.max(...temps) / step) * step;
  if (high === low) {
    low -= step;
    high += step;
  }

  const plotWidth = frame.width - frame.left - frame.right;
  const plotHeight = frame.height - frame.top - frame.bottom;
  const x = (ms: number) => frame.left + ((ms - fromMs) / (untilMs - fromMs)) * plotWidth;
  const y = (temp: number) => frame.top + ((high - temp) / (high - low)) * plotHeight;

  const yTicks: { y: number; value: number }[] = [];
  for (let value = low; value <= high + 1e-9; value += step) yTicks.push({ y: y(value), value });

  return {
    frame,
    unit: unitSystemUnits[input.unitSystem].temperature.symbol,
    fromMs,
    toMs: untilMs,
    spans: coreSpans.map((s) => ({
      source: s.source,
      belowMinimum: s.belowMinimum,
      from: s.from,
      to: s.to,
      x1: x(s.fromMs),
      x2: x(s.toMs),
      y1: y(shown(s.startTempC)),
      y2: y(shown(s.endTempC)),
      temp: shown(s.tempC),
    })),
    dots: readings.map((r) => ({ x: x(toMs(r.at)), y: y(shown(r.tempC)), at: r.at, temp: shown(r.tempC) })),
    minimum: { y: y(shown(input.product.minWorkTempC)), temp: shown(input.product.minWorkTempC) },
    pouredX: Number.isFinite(pouredMs) ? x(pouredMs) : null,
    forecast: ahead.map((p) => ({ from: p.from, to: p.to, x1: x(p.fromMs), x2: x(p.toMs), y: y(shown(p.tempC)), temp: shown(p.tempC) })),
    nowX: ahead.length > 0 ? x(ahead[0]!.fromMs) : null,
    yTicks,
  };
}
