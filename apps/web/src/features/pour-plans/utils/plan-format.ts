import { convertLength, type UnitSystem } from '@gelpoint/core';

/** "8 h 20 min", "45 min", "3 d 4 h": cure times at a glance, rounded to the minute. */
export function formatHours(hours: number): string {
  if (!Number.isFinite(hours)) return 'not reached';
  const totalMin = Math.round(hours * 60);
  if (totalMin < 60) return `${totalMin} min`;
  const totalH = Math.floor(totalMin / 60);
  const min = totalMin % 60;
  if (totalH < 48) return min === 0 ? `${totalH} h` : `${totalH} h ${min} min`;
  const days = Math.floor(totalH / 24);
  const h = totalH % 24;
  return h === 0 ? `${days} d` : `${days} d ${h} h`;
}

export function formatMinutes(minutes: number): string {
  return `${Math.round(minutes)} min`;
}

/** The wetted area for the seal coat: m² in a metric shop, ft² in a US one. */
export function formatArea(areaMm2: number, unitSystem: UnitSystem): string {
  if (unitSystem === 'metric') return `${(areaMm2 / 1_000_000).toFixed(3)} m²`;
  const mmPerFoot = convertLength(12, 'in', 'mm');
  return `${(areaMm2 / (mmPerFoot * mmPerFoot)).toFixed(2)} ft²`;
}
