import { formatLength, type UnitSystem } from '@gelpoint/core';
import { Button } from '../../../components/ui/Button';
import type { MoldFileUnits, MoldUnits } from '../types';
import { fileUnitWords } from '../utils/file-units';
import type { Vec3 } from '../utils/mould-file-reading';
import { guessUnits } from '../utils/units-guess';

function sizeText(sizeMm: Vec3, unitSystem: UnitSystem): string {
  return sizeMm.map((side) => formatLength(side, unitSystem).text).join(' × ');
}

export interface UnitsHintProps {
  /** The model's extent in the file's own numbers. */
  sizeInFileUnits: Vec3;
  units: MoldFileUnits;
  unitSystem: UnitSystem;
  /** Offered as buttons; absent after upload, where the hint only tells what to re-upload with. */
  onChoose?: (units: MoldUnits) => void;
}

/** How big the mould comes out in the chosen unit, and which other unit looks likelier when that size is odd. */
export function UnitsHint({ sizeInFileUnits, units, unitSystem, onChoose }: UnitsHintProps) {
  const guess = guessUnits(sizeInFileUnits, units);
  const size = sizeText(guess.chosen.sizeMm, unitSystem);
  if (guess.doubt === null) {
    return (
      <p className="text-sm text-ink-soft">
        Read as {fileUnitWords[units].plural}, the mould is {size}.
      </p>
    );
  }
  return (
    <div className="flex flex-col gap-2 rounded-lg border border-resin-500 bg-resin-50 px-3 py-2 text-resin-700">
      <p>
        Read as {fileUnitWords[units].plural}, the mould would be {size}, which is {guess.doubt === 'too_small' ? 'very small' : 'very large'} for a mould.
        {guess.alternatives.map((other) => (
          <span key={other.units}>
            {' '}
            Looks like {fileUnitWords[other.units].plural}? It would be {sizeText(other.sizeMm, unitSystem)}.
          </span>
        ))}{' '}
        You decide: choose the unit the file was exported in.
      </p>
      {onChoose && guess.alternatives.length > 0 ? (
        <div className="flex flex-wrap gap-2">
          {guess.alternatives.map((other) => (
            <Button key={other.units} variant="secondary" onClick={() => onChoose(other.units)}>
              Read it as {fileUnitWords[other.units].plural}
            </Button>
          ))}
        </div>
      ) : null}
    </div>
  );
}
