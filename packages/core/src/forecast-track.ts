import type { ForecastPiece } from './cure-model';

const hourMs = 3_600_000;

/**
 * The forecast temperatures worth drawing: from now until the last stage still ahead is reached (a day when none is
 * ahead), at most a week. The last piece of a forecast runs to infinity; this cuts it there.
 */
export function forecastTrack(
  ahead: readonly ForecastPiece[],
  stages: readonly { reached: boolean; predictedAt: string | null }[],
  asOfMs: number,
): ForecastPiece[] {
  const predicted = stages.filter((s) => !s.reached && s.predictedAt).map((s) => Date.parse(s.predictedAt!));
  const lastStage = predicted.length > 0 ? Math.max(...predicted) : asOfMs + 24 * hourMs;
  const until = Math.min(Math.max(lastStage, asOfMs + hourMs), asOfMs + 7 * 24 * hourMs);
  return ahead
    .filter((p) => p.fromMs < until && p.toMs > asOfMs)
    .map((p) => ({ fromMs: Math.max(p.fromMs, asOfMs), toMs: Math.min(p.toMs, until), tempC: p.tempC }));
}
