import { describe, expect, it } from 'vitest';
import { ResinSystemInput } from './shelf';

// An invented data sheet shaped like a deep-pour product's; only the order of its times matters here.
const sheet = {
  name: 'Order check',
  use: 'deep_pour',
  mixRatio: { a: 2, b: 1, basis: 'volume' },
  densityAGPerMl: 1.16,
  densityBGPerMl: 0.97,
  potLifeMin: 45,
  gelTimeH: 10,
  tackFreeH: 16,
  recoatWindow: { earliestH: 12, latestH: 36 },
  demoldH: 48,
  fullCureH: 168,
  referenceTempC: 22,
  minWorkTempC: 18,
  maxWorkTempC: 30,
  maxLayerMm: 50,
  maxBatchG: 4000,
  pricePerKit: 120,
  kitSizeG: 4500,
  shelfLifeMonths: 12,
};

const messages = (input: object) => ResinSystemInput.safeParse(input).error?.issues.map((i) => `${i.path.join('.')}: ${i.message}`) ?? [];

describe('a resin system’s times in the order a cure reaches them', () => {
  it('takes gel ≤ tack-free ≤ demold ≤ ready to machine ≤ full cure', () => {
    expect(messages({ ...sheet, readyToMachineH: 96 })).toEqual([]);
  });

  it('refuses demold before gel, naming both', () => {
    const why = 'tack-free (4 h) comes before gel (10 h); a cure reaches gel, tack-free, demold, machining and full cure in that order — check the data sheet';
    expect(messages({ ...sheet, demoldH: 5, tackFreeH: 4 })).toEqual([`gelTimeH: ${why}`, `tackFreeH: ${why}`]);
  });

  it('refuses ready to machine after full cure, and a pot life longer than the gel time', () => {
    expect(messages({ ...sheet, readyToMachineH: 200 })[0]).toMatch(/^readyToMachineH: full cure \(168 h\) comes before ready to machine \(200 h\)/);
    expect(messages({ ...sheet, potLifeMin: 700 })[0]).toMatch(/^potLifeMin: the pot life cannot be longer than the gel time/);
  });
});
