import { describe, expect, it } from 'vitest';
import { warningNotes } from './mold-warnings';

describe('warningNotes', () => {
  it('says each problem once, in plain words, with the level’s own sentence', () => {
    const notes = warningNotes(
      [
        { code: 'inverted_normals_fixed', message: 'The surface was inside out; it has been turned.' },
        { code: 'trapped_air', message: 'Air at the top.' },
      ],
      [{ code: 'trapped_air', message: 'At 20 mm, 3 mL of air stays under an overhang.' }],
    );
    expect(notes.map((n) => n.code)).toEqual(['trapped_air', 'inverted_normals_fixed']);
    expect(notes[0]).toMatchObject({ title: 'Air would be trapped', message: 'At 20 mm, 3 mL of air stays under an overhang.', kind: 'check' });
    expect(notes[1]?.kind).toBe('fixed');
  });

  it('still shows a warning it has no title for', () => {
    const [note] = warningNotes([{ code: 'something_new', message: 'A new check spoke up.' }], []);
    expect(note).toMatchObject({ title: 'Check the model', message: 'A new check spoke up.', kind: 'check' });
  });
});
