import { ResinSystemInput } from '@gelpoint/contracts';
import { describe, expect, it } from 'vitest';
import { optionalNumber, optionalText, requiredNumber } from './form-input';

describe('number fields', () => {
  it('reads typed numbers, a decimal comma too', () => {
    expect(requiredNumber('1.16')).toBe(1.16);
    expect(requiredNumber(' 0,97 ')).toBe(0.97);
    expect(optionalNumber('55')).toBe(55);
  });

  it('reads a typographic minus (U+2212, as phones type it) and refuses what is not a plain decimal', () => {
    expect(requiredNumber('\u221240')).toBe(-40);
    expect(optionalNumber('\u22125,5')).toBe(-5.5);
    expect(requiredNumber('0x10')).toBeNaN();
    expect(requiredNumber('12 g')).toBeNaN();
    expect(requiredNumber('Infinity')).toBeNaN();
  });

  it('turns an empty required field into NaN and an empty optional one into null', () => {
    expect(requiredNumber('')).toBeNaN();
    expect(optionalNumber('  ')).toBeNull();
    expect(optionalNumber(Number.NaN)).toBeNull();
    expect(optionalText('')).toBeNull();
    expect(optionalText(' 2027-01-31 ')).toBe('2027-01-31');
  });

  // Reference: the API's own zod contract must refuse an empty required number with its sentence, and accept null.
  it('hands the contract values it refuses or accepts in its own words', () => {
    const shape = ResinSystemInput.safeParse({ potLifeMin: requiredNumber(''), activationEnergyKJPerMol: optionalNumber('') });
    expect(shape.success).toBe(false);
    const messages = shape.error!.issues.map((issue) => `${issue.path.join('.')}: ${issue.message}`);
    expect(messages).toContain('potLifeMin: pot life must be a number');
    expect(messages.some((m) => m.startsWith('activationEnergyKJPerMol'))).toBe(false);
  });
});
