import type { PourView, Role, Shop } from '@gelpoint/contracts';
import { handlingCautions } from '@gelpoint/core';
import { Alert } from '../../../components/ui/Alert';
import type { RunSheet as RunSheetData } from '../utils/plan-run-sheet';
import { BatchCard } from './BatchCard';

const afterPouring = new Set(['heat_near_vapour', 'leftover_disposal']);

/** The plan's cups in mixing order, each logged against its own card. */
export function RunSheet({ pour, sheet, shop, viewer }: { pour: PourView; sheet: RunSheetData; shop: Shop; viewer: { userId: string; role: Role } }) {
  const loggedByIndex = new Map(pour.batches.map((batch) => [batch.planBatchIndex, batch]));
  const next = sheet.cups.find((cup) => !loggedByIndex.has(cup.index));
  const open = pour.status === 'open';
  return (
    <div className="flex flex-col gap-5">
      <p className="text-lg">
        <strong>{pour.batches.length}</strong> of <strong>{sheet.cups.length}</strong> cups logged.
        {next && open ? ` Next: cup ${next.order}, ${next.pourLabel.toLowerCase()}.` : ''}
      </p>
      {sheet.cups.map((cup) => (
        <BatchCard
          key={cup.index}
          pourId={pour.id}
          cup={cup}
          of={sheet.cups.length}
          logged={loggedByIndex.get(cup.index)}
          shop={shop}
          shopTempC={pour.assumedTempC}
          viewer={viewer}
          open={open}
          isNext={open && next?.index === cup.index}
        />
      ))}
      {pour.voidedBatches.length > 0 ? (
        <section aria-label="Voided cups" className="flex flex-col gap-2 rounded-xl border border-line bg-paper p-4">
          <h3 className="font-bold">Voided cups</h3>
          <ul className="flex flex-col gap-1">
            {pour.voidedBatches.map((b) => (
              <li key={b.id}>
                Cup {(sheet.cups.find((c) => c.index === b.planBatchIndex)?.order ?? b.planBatchIndex + 1).toString()}, mixed by{' '}
                {b.mixedBy?.name ?? 'a former member'}: voided
                {b.voided?.by ? ` by ${b.voided.by.name}` : ''} — {b.voided?.reason}
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      <Alert tone="info" live="none" title="After pouring">
        <ul className="flex list-disc flex-col gap-1 pl-5">
          {handlingCautions()
            .filter((c) => afterPouring.has(c.code))
            .map((c) => (
              <li key={c.code}>{c.message}</li>
            ))}
        </ul>
      </Alert>
    </div>
  );
}
