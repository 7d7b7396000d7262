import { MoldUnits as MoldUnitsSchema } from '@gelpoint/contracts';
import type { MoldFileUnits, MoldUnits } from '../types';
import { fileUnitWords } from './file-units';

/** The names a mould file may have; the server tells the format from the content. */
export const mouldFileName = /\.(stl|3mf|obj)$/i;

/** The units choice that leaves a 3MF's own unit in force (no units are sent). */
export const asTheFileStates = '';

/** What the file's numbers will be read in: the maker's choice, else the unit a 3MF states; null while unknown. */
export function effectiveUnits(choice: MoldUnits | typeof asTheFileStates, fileUnits: MoldFileUnits | null): MoldFileUnits | null {
  return choice === asTheFileStates ? fileUnits : choice;
}

/** The units select: the file's own unit first when it states one, then the units a maker may choose. */
export function unitsChoices(fileUnits: MoldFileUnits | null): { value: string; label: string }[] {
  const chosen = MoldUnitsSchema.options.map((units) => ({ value: units, label: fileUnitWords[units].label }));
  if (fileUnits === null) return chosen;
  return [{ value: asTheFileStates, label: `As the file states: ${fileUnitWords[fileUnits].plural}` }, ...chosen];
}
