import type { EntityManager } from 'typeorm';
import { Lot, Pigment, ResinSystem } from '../entities';

// Invented products with numbers of the kind their data sheets give; demo data only (the exotherm settings too:
// heats of reaction, film gel times, heat capacities, conductivities and accepted peaks are plausible, not measured).
const resinSystems = [
  {
    name: 'Kettle Deep Pour 2:1',
    maker: 'Demo Resin Co.',
    use: 'deep_pour' as const,
    ratioA: 2, ratioB: 1, ratioBasis: 'volume' as const,
    densityAGPerMl: 1.15, densityBGPerMl: 0.97,
    potLifeMin: 60, gelTimeH: 10, tackFreeH: 24, recoatEarliestH: 18, recoatLatestH: 48, demoldH: 72, fullCureH: 168, readyToMachineH: null,
    referenceTempC: 22, minWorkTempC: 18, maxWorkTempC: 30, maxLayerMm: 50, maxBatchG: 6000, activationEnergyKJPerMol: null, hardnessShoreD: null,
    reactionHeatJPerG: 380, thinFilmGelMin: 900, heatCapacityJPerGK: 1.6, conductivityWPerMK: 0.19, acceptedPeakC: 55,
    pricePerKit: 165, kitSizeG: 6000, shelfLifeMonths: 12,
  },
  {
    name: 'Kettle Seal & Coat 1:1',
    maker: 'Demo Resin Co.',
    use: 'coating' as const,
    ratioA: 1, ratioB: 1, ratioBasis: 'volume' as const,
    densityAGPerMl: 1.13, densityBGPerMl: 0.98,
    potLifeMin: 25, gelTimeH: 1.5, tackFreeH: 5, recoatEarliestH: 4, recoatLatestH: 24, demoldH: 24, fullCureH: 72, readyToMachineH: null,
    referenceTempC: 22, minWorkTempC: 15, maxWorkTempC: 32, maxLayerMm: 3, maxBatchG: 1000, activationEnergyKJPerMol: null, hardnessShoreD: null,
    reactionHeatJPerG: 450, thinFilmGelMin: 120, heatCapacityJPerGK: null, conductivityWPerMK: null, acceptedPeakC: 60,
    pricePerKit: 78, kitSizeG: 2000, shelfLifeMonths: 18,
  },
  {
    name: 'Brightcast 100:45',
    maker: 'Demo Resin Co.',
    use: 'casting' as const,
    ratioA: 100, ratioB: 45, ratioBasis: 'weight' as const,
    densityAGPerMl: 1.16, densityBGPerMl: 0.96,
    potLifeMin: 35, gelTimeH: 4, tackFreeH: 10, recoatEarliestH: 8, recoatLatestH: 24, demoldH: 24, fullCureH: 96, readyToMachineH: 72,
    referenceTempC: 23, minWorkTempC: 18, maxWorkTempC: 29, maxLayerMm: 25, maxBatchG: 2500, activationEnergyKJPerMol: 55, hardnessShoreD: 82,
    reactionHeatJPerG: 430, thinFilmGelMin: 330, heatCapacityJPerGK: 1.45, conductivityWPerMK: 0.21, acceptedPeakC: 65,
    pricePerKit: 110, kitSizeG: 4350, shelfLifeMonths: 12,
  },
];

const pigments = [
  { name: 'Smoky Teal mica', kind: 'powder' as const, densityGPerMl: 2.8, recommendedPct: 1, maxPct: 3, pricePerPack: 14, packSizeG: 50 },
  { name: 'Pearl White paste', kind: 'paste' as const, densityGPerMl: 1.4, recommendedPct: 2, maxPct: 6, pricePerPack: 18, packSizeG: 100 },
];

const isoDay = (offsetDays: number) => new Date(Date.now() + offsetDays * 86_400_000).toISOString().slice(0, 10);

export async function seedDemoShelf(m: EntityManager, shopId: string): Promise<void> {
  // One after another: a transaction's queries share one connection.
  const saved: ResinSystem[] = [];
  for (const r of resinSystems) saved.push(await m.save(m.create(ResinSystem, { ...r, shopId })));
  const shades: Pigment[] = [];
  for (const p of pigments) shades.push(await m.save(m.create(Pigment, { ...p, shopId })));
  const [teal, pearl] = shades;
  const [deep, seal] = saved;
  const lots = [
    { part: 'A' as const, resinSystemId: deep!.id, lotNumber: 'KDP-A-2611', quantityG: 4000, remainingG: 3100, receivedOn: isoDay(-30), expiresOn: isoDay(335) },
    { part: 'B' as const, resinSystemId: deep!.id, lotNumber: 'KDP-B-2611', quantityG: 2000, remainingG: 1550, receivedOn: isoDay(-30), expiresOn: isoDay(335) },
    { part: 'A' as const, resinSystemId: seal!.id, lotNumber: 'KSC-A-2503', quantityG: 1000, remainingG: 640, receivedOn: isoDay(-250), expiresOn: isoDay(290) },
    { part: 'B' as const, resinSystemId: seal!.id, lotNumber: 'KSC-B-2409', quantityG: 1000, remainingG: 420, receivedOn: isoDay(-420), expiresOn: isoDay(-12), notes: 'Past its date: test a small cup before using.' },
    { part: 'pigment' as const, pigmentId: teal!.id, lotNumber: 'STM-0917', quantityG: 50, remainingG: 4, receivedOn: isoDay(-90), expiresOn: null },
    { part: 'pigment' as const, pigmentId: pearl!.id, lotNumber: 'PWP-1102', quantityG: 100, remainingG: 100, receivedOn: isoDay(-10), expiresOn: isoDay(720) },
  ];
  for (const lot of lots) await m.save(m.create(Lot, { resinSystemId: null, pigmentId: null, notes: '', ...lot, shopId }));
}
