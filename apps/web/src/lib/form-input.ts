import { readDecimal } from '@gelpoint/core';

/**
 * Form inputs hand over text. A required number left empty becomes NaN, which the contract refuses with its own
 * sentence ("pot life must be a number"); an optional one becomes null, meaning "not given". A decimal comma is read
 * as a point, a typographic minus (−40) as a minus; anything but a plain decimal (0x10, 1e, 12 g) is not a number.
 */
export function requiredNumber(raw: unknown): number {
  if (typeof raw === 'number') return raw;
  return readDecimal(String(raw ?? '')) ?? Number.NaN;
}

export function optionalNumber(raw: unknown): number | null {
  if (raw === null || raw === undefined) return null;
  if (typeof raw === 'number') return Number.isNaN(raw) ? null : raw;
  const text = String(raw);
  return text.trim() === '' ? null : (readDecimal(text) ?? Number.NaN);
}

export function optionalText(raw: unknown): string | null {
  const text = String(raw ?? '').trim();
  return text === '' ? null : text;
}
