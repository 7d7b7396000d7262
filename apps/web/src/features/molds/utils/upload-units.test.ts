import { describe, expect, it } from 'vitest';
import { asTheFileStates, effectiveUnits, mouldFileName, unitsChoices } from './upload-units';

describe('upload units', () => {
  it('takes the three formats by name, in any case', () => {
    for (const name of ['tray.stl', 'TRAY.STL', 'bowl.3mf', 'inlay.OBJ', 'a.b.obj']) expect(mouldFileName.test(name)).toBe(true);
    for (const name of ['tray.step', 'tray.stl.zip', 'tray', 'obj', 'tray.3mf.txt']) expect(mouldFileName.test(name)).toBe(false);
  });

  it('reads a 3MF in its own unit unless the maker picks another; other files in the maker’s', () => {
    expect(effectiveUnits(asTheFileStates, 'in')).toBe('in');
    expect(effectiveUnits('mm', 'in')).toBe('mm');
    expect(effectiveUnits('cm', null)).toBe('cm');
    expect(effectiveUnits(asTheFileStates, null)).toBeNull();
  });

  it('offers the file’s own unit first when it states one', () => {
    expect(unitsChoices(null).map((o) => o.value)).toEqual(['mm', 'cm', 'in']);
    const for3mf = unitsChoices('ft');
    expect(for3mf.map((o) => o.value)).toEqual([asTheFileStates, 'mm', 'cm', 'in']);
    expect(for3mf[0]!.label).toBe('As the file states: feet');
  });
});
