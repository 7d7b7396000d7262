export type CautionSeverity = 'info' | 'warning' | 'danger';

export type CautionTarget = 'plan' | 'layer' | 'batch' | 'product' | 'pigment';

/** Cautions are data so every screen, run sheet and e-mail can show them in its own way. */
export interface Caution {
  code: string;
  severity: CautionSeverity;
  message: string;
  /** index is 0-based within its kind: layers from the floor up, batches in run-sheet order. */
  appliesTo: { kind: CautionTarget; index?: number };
}

export function caution(code: string, severity: CautionSeverity, message: string, kind: CautionTarget, index?: number): Caution {
  return { code, severity, message, appliesTo: index === undefined ? { kind } : { kind, index } };
}

/**
 * What every pour carries, whatever its numbers: general workshop precautions for amine-cured
 * epoxies, worded as reminders that defer to the product's own documents.
 */
export function handlingCautions(): Caution[] {
  return [
    caution('ventilation', 'warning', 'Mix and pour with good ventilation, and keep the room ventilated while the resin cures.', 'plan'),
    caution(
      'skin_protection',
      'warning',
      'Wear nitrile gloves and long sleeves: uncured resin and hardener can sensitise the skin, and a sensitised person reacts to ever smaller contact. Wash skin with soap and water, never with solvent.',
      'plan',
    ),
    caution('eye_protection', 'warning', 'Wear safety glasses while mixing and pouring; splashes of hardener harm the eyes.', 'plan'),
    caution(
      'heat_near_vapour',
      'warning',
      'Heat guns and torches used to lift bubbles are ignition sources: keep them away from solvents, release agents and other flammable vapour, and never leave them on over the pour.',
      'plan',
    ),
    caution(
      'leftover_disposal',
      'info',
      'Let leftover mixed resin cure in its cup in a safe spot, away from anything that burns, before disposing of it; a full cup can grow very hot. Dispose of unmixed part A and part B as the SDS says.',
      'plan',
    ),
    caution(
      'follow_sds_tds',
      'info',
      "These numbers are planning aids. Follow the product's SDS and TDS and your local codes; where they differ from this plan, they win.",
      'plan',
    ),
  ];
}
