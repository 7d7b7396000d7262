import { CavityReport } from '@gelpoint/contracts';
import { analyzeCavity, prepareMesh, storedAnalysisJson, type StoredCavityReport } from '@gelpoint/mesh';
import { describe, expect, expectTypeOf, it } from 'vitest';
import { cellSolid } from '../../../../packages/mesh/test/moulds';

// The worker and the API's upload both store the report storedAnalysisJson writes, and the API answers it as the
// contract's CavityReport: the two shapes must not drift apart.
describe('the stored cavity report', () => {
  it('has the type of the contract, checked by the compiler', () => {
    expectTypeOf<StoredCavityReport>().toExtend<CavityReport>();
  });

  it("is read whole by the contract's schema", () => {
    // A 30 × 30 × 10 mm block with a 10 × 10 mm pocket from z = 4 up.
    const block = cellSolid([0, 10, 20, 30], [0, 10, 20, 30], [0, 4, 10], (i, j, k) => !(i === 1 && j === 1 && k === 1));
    const mesh = prepareMesh({ positions: Float32Array.from(block.positions), triangleCount: block.triangleCount, format: 'binary', warnings: [] });
    if (!mesh.ok) throw new Error(mesh.error.message);
    const analysis = analyzeCavity(mesh.value);
    if (!analysis.ok) throw new Error(analysis.error.message);
    const stored = JSON.parse(storedAnalysisJson(analysis.value).reportJson) as unknown;
    // Parsing keeps only the keys the schema knows: nothing may be lost, and the fill is the pocket's 10 × 10 × 6 mm.
    expect(CavityReport.parse(stored)).toEqual(stored);
    expect((stored as CavityReport).fillToTop.volumeMm3).toBeCloseTo(600, 6);
  });
});
