import { Alert } from '../../../components/ui/Alert';
import type { Cure } from '../types';

/** The cure model's own warnings (stalled, assumed, window closed), worded by the server. */
export function CureCautions({ cautions }: { cautions: Cure['cautions'] }) {
  if (cautions.length === 0) return null;
  return (
    <div className="flex flex-col gap-2">
      {cautions.map((c) => (
        <Alert key={c.code} tone={c.severity === 'info' ? 'info' : 'warning'} live="none">
          {c.message}
        </Alert>
      ))}
    </div>
  );
}
