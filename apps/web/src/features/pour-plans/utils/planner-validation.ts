import { PourPlanInput } from '@gelpoint/contracts';
import { set, type FieldErrors, type Resolver } from 'react-hook-form';
import { pourPlanInputOf, type PlannerValues, type SavedPlanInput } from './planner-values';

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
  'cupWaste.amount': 'cup waste must be a number from 0 to 10000',
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

function wordsFor(field: string, message: string): string {
  const plainer = plainerWords[field];
  return plainer && stockMessage.test(message) ? plainer : message;
}

/** Checks the form against the API's own contract, so the page refuses exactly what the server would. */
export function checkPlanner(values: PlannerValues, pieceId: string): PlannerCheck {
  const parsed = PourPlanInput.safeParse(pourPlanInputOf(values, pieceId));
  if (parsed.success) return { ok: true, input: parsed.data };
  const fieldErrors: Record<string, string> = {};
  for (const issue of parsed.error.issues) {
    const field = fieldOfIssuePath(issue.path);
    fieldErrors[field] ??= wordsFor(field, issue.message);
  }
  return { ok: false, fieldErrors };
}

export function plannerResolver(pieceId: string): Resolver<PlannerValues, unknown, SavedPlanInput> {
  return async (values) => {
    const check = checkPlanner(values, pieceId);
    if (check.ok) return { values: check.input, errors: {} };
    const errors: FieldErrors<PlannerValues> = {};
    for (const [field, message] of Object.entries(check.fieldErrors)) set(errors, field, { type: 'contract', message });
    return { values: {}, errors };
  };
}
