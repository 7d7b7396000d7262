import type { Caution } from '@gelpoint/core';
import { Alert, type AlertTone } from '../../../components/ui/Alert';

const tone: Record<Caution['severity'], AlertTone> = { info: 'info', warning: 'warning', danger: 'error' };

/** Core's cautions as alerts; they are part of the page, so they do not interrupt a screen reader as they change. */
export function CautionList({ cautions, label }: { cautions: readonly Caution[]; label: string }) {
  if (cautions.length === 0) return null;
  return (
    <ul className="flex flex-col gap-2" aria-label={label}>
      {cautions.map((caution) => (
        <li key={caution.code}>
          <Alert tone={tone[caution.severity]} live="none">
            {caution.message}
          </Alert>
        </li>
      ))}
    </ul>
  );
}
