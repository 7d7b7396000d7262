import { PourPlanInput } from '@gelpoint/contracts';
import type { UnitSystem } from '@gelpoint/core';
import { set, type FieldErrors, type Resolver } from 'react-hook-form';
import type { z } from 'zod';
import { basePlannerValues, metricPlannerUnits, quantityOfField, shownLimit, shownUnitNames, type PlannerUnits } from './planner-units';
import { pourPlanInputOf, type PlannerValues, type SavedPlanInput } from './planner-values';

type ContractIssue = z.core.$ZodIssue;

export type PlannerCheck = { ok: true; input: SavedPlanInput } | { ok: false; fieldErrors: Record<string, string> };

// Where the contract's message is a generic one (or names an id the maker never sees), the form says it its way.
const plainerWords: Record<string, string> = {
  'deepPour.resinSystemId': 'choose the product for the deep pour',
  'deepPour.pigmentId': 'choose a pigment, or none',
  'sealCoat.resinSystemId': 'choose the product for the seal coat',
  'sealCoat.absorptionFactor': 'choose how much the wood soaks up, or enter a factor from 1 to 5',
  'sealCoat.coats': 'coats must be a whole number from 1 to 10',
  'cavity.moldId': 'choose the mould',
  'cavity.shape.kind': 'choose a quick shape',
  shopTempC: 'the shop temperature must be a number from −30 to 60 °C',
  'shopAir.rhPct': 'relative humidity must be a number from 0 to 100 %',
  'shopAir.surfaceTempC': 'the surface temperature must be a number from −30 to 80 °C',
  'cupWaste.amount': 'cup waste must be a number from 0 to 500',
};

// The same, for a form in inches and °F: the contract's limits (°C, g, mL) said in the units it shows.
const plainerRanges: Record<string, { words: string; min: number; max: number }> = {
  shopTempC: { words: 'the shop temperature must be a number', min: -30, max: 60 },
  'shopAir.surfaceTempC': { words: 'the surface temperature must be a number', min: -30, max: 80 },
  'cupWaste.amount': { words: 'cup waste must be a number', min: 0, max: 500 },
};

// zod's stock sentences, and the id check the maker never sees as an id.
const stockMessage = /^(Invalid|Too (small|big)|Expected)|must be an id \(a UUID\)/;

/** The form field a contract issue belongs to: the same path, except the cup-waste amount and the cavity choice. */
export function fieldOfIssuePath(path: readonly PropertyKey[]): string {
  const parts = path.map(String);
  if (parts[0] === 'cupWaste') return 'cupWaste.amount';
  if (parts[0] === 'cavity' && parts.length === 1) return 'cavity.source';
  return parts.join('.');
}

function shownNumber(value: number): string {
  return value < 0 ? `\u2212${-value}` : String(value);
}

function plainerFor(field: string, values: PlannerValues, unitSystem: UnitSystem): string | undefined {
  const range = plainerRanges[field];
  const quantity = quantityOfField(field, values);
  if (unitSystem === 'metric' || !range || !quantity) return plainerWords[field];
  const min = shownLimit(range.min, quantity, unitSystem, 'min');
  const max = shownLimit(range.max, quantity, unitSystem, 'max');
  return `${range.words} from ${shownNumber(min)} to ${shownNumber(max)} ${shownUnitNames(unitSystem)[quantity]}`;
}

// The contract names its limits in mm and °C; a form in inches and °F restates them in its own units.
function inShownUnits(issue: ContractIssue, field: string, values: PlannerValues, unitSystem: UnitSystem): string {
  const quantity = quantityOfField(field, values);
  if (unitSystem === 'metric' || !quantity) return issue.message;
  const unit = shownUnitNames(unitSystem)[quantity];
  const subject = /^(.+?) must be /.exec(issue.message)?.[1];
  if (subject && issue.code === 'too_big' && typeof issue.maximum === 'number') {
    return `${subject} must be at most ${shownNumber(shownLimit(issue.maximum, quantity, unitSystem, 'max'))} ${unit}`;
  }
  if (subject && issue.code === 'too_small' && typeof issue.minimum === 'number' && issue.minimum !== 0) {
    return `${subject} must be at least ${shownNumber(shownLimit(issue.minimum, quantity, unitSystem, 'min'))} ${unit}`;
  }
  const base = shownUnitNames('metric')[quantity];
  return issue.message.replace(`(${base})`, `(${unit})`);
}

function wordsFor(issue: ContractIssue, field: string, values: PlannerValues, unitSystem: UnitSystem): string {
  const plainer = plainerFor(field, values, unitSystem);
  return plainer && stockMessage.test(issue.message) ? plainer : inShownUnits(issue, field, values, unitSystem);
}

/**
 * Checks the form, typed in the shop's units, against the API's own contract, so the page refuses exactly what the
 * server would; a clean form comes back as the contract's values in mm and °C.
 */
export function checkPlanner(values: PlannerValues, pieceId: string, units: PlannerUnits = metricPlannerUnits): PlannerCheck {
  const parsed = PourPlanInput.safeParse(pourPlanInputOf(basePlannerValues(values, units), pieceId));
  if (parsed.success) return { ok: true, input: parsed.data };
  const fieldErrors: Record<string, string> = {};
  for (const issue of parsed.error.issues) {
    const field = fieldOfIssuePath(issue.path);
    fieldErrors[field] ??= wordsFor(issue, field, values, units.unitSystem);
  }
  return { ok: false, fieldErrors };
}

export function plannerResolver(pieceId: string, units: PlannerUnits = metricPlannerUnits): Resolver<PlannerValues, unknown, SavedPlanInput> {
  return async (values) => {
    const check = checkPlanner(values, pieceId, units);
    if (check.ok) return { values: check.input, errors: {} };
    const errors: FieldErrors<PlannerValues> = {};
    for (const [field, message] of Object.entries(check.fieldErrors)) set(errors, field, { type: 'contract', message });
    return { values: {}, errors };
  };
}
