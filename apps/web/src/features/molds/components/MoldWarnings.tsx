import { Alert } from '../../../components/ui/Alert';
import type { WarningNote } from '../utils/mold-warnings';

/** What the analysis noticed about the mesh and this level, things to check first, repairs after. */
export function MoldWarnings({ notes }: { notes: readonly WarningNote[] }) {
  if (notes.length === 0) {
    return (
      <Alert tone="success" live="none">
        The mesh is closed and faces the right way; nothing to check.
      </Alert>
    );
  }
  return (
    <ul className="flex flex-col gap-2" aria-label="What the analysis noticed">
      {notes.map((note) => (
        <li key={note.code}>
          <Alert tone={note.kind === 'check' ? 'warning' : 'info'} title={note.title} live="none">
            {note.message}
          </Alert>
        </li>
      ))}
    </ul>
  );
}
