import { pieceStages } from '@gelpoint/contracts';
import { describe, expect, it } from 'vitest';
import { stageWords } from './stage-words';

describe('stageWords', () => {
  it('names every stage the API knows, each with its own label', () => {
    expect(Object.keys(stageWords).sort()).toEqual([...pieceStages].sort());
    const labels = pieceStages.map((stage) => stageWords[stage].label);
    expect(new Set(labels).size).toBe(labels.length);
  });
});
