import { type BatchView, mayVoidEntry, type Role, type Shop } from '@gelpoint/contracts';
import { formatTemperature, potLifeMinAt } from '@gelpoint/core';
import { useId, useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { cx } from '../../../lib/cx';
import { useOutboxEntries } from '../../../lib/offline/outbox-context';
import { useMixingStart } from '../hooks/use-mixing-start';
import type { RunSheetCup } from '../utils/plan-run-sheet';
import { LogBatchForm } from './LogBatchForm';
import { LoggedBatch } from './LoggedBatch';
import { PotLifeClock } from './PotLifeClock';
import { TargetAmounts } from './TargetAmounts';
import { VoidEntryButton } from './VoidEntryButton';

export interface BatchCardProps {
  pourId: string;
  cup: RunSheetCup;
  of: number;
  logged: BatchView | undefined;
  shop: Shop;
  /** The plan's shop temperature: the pot life is the one the plan and the printed run sheet show. */
  shopTempC: number;
  viewer: { userId: string; role: Role };
  /** Whether batches can still be logged (the pour is open). */
  open: boolean;
  /** The next cup to mix gets a stronger frame. */
  isNext: boolean;
}

/** One cup of the run sheet: its targets, its pot-life clock and its log. */
export function BatchCard({ pourId, cup, of, logged, shop, shopTempC, viewer, open, isNext }: BatchCardProps) {
  const headingId = useId();
  const [logging, setLogging] = useState(false);
  const mixing = useMixingStart(pourId, cup.index);
  // A cup logged while the connection was down: kept on the phone until the server takes it.
  const kept = useOutboxEntries().find(
    (e) => e.kind === 'batch' && e.pourId === pourId && e.request.type === 'json' && e.request.body.planBatchIndex === cup.index,
  );

  return (
    <section
      aria-labelledby={headingId}
      className={cx('flex flex-col gap-4 rounded-xl border bg-white p-4 shadow-sm sm:p-6', isNext ? 'border-2 border-walnut-800' : 'border-line')}
    >
      <header className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <h3 id={headingId} className="text-2xl font-bold text-walnut-900">
            Cup {cup.order} of {of}
          </h3>
          <p className="text-ink-soft">
            {cup.pourLabel} · batch {cup.batchInPour} of {cup.batchesInPour} · {cup.product.name}
          </p>
        </div>
        {logged ? (
          <span className="inline-flex items-center gap-1.5 rounded-full border border-moss-600 bg-moss-50 px-3 py-1 font-semibold text-moss-700">
            <span aria-hidden="true">✓</span> Logged
          </span>
        ) : kept ? (
          <span className="inline-flex items-center gap-1.5 rounded-full border border-resin-500 bg-resin-50 px-3 py-1 font-semibold text-walnut-900">
            <span aria-hidden="true">↻</span> {kept.state === 'refused' ? 'Not taken' : 'Kept on this phone'}
          </span>
        ) : (
          <span className="inline-flex items-center gap-1.5 rounded-full border border-walnut-300 bg-paper px-3 py-1 font-semibold text-walnut-800">
            <span aria-hidden="true">○</span> To mix
          </span>
        )}
      </header>

      {logged ? null : (
        <TargetAmounts
          partAG={cup.targetAG}
          partBG={cup.targetBG}
          pigmentG={cup.targetPigmentG}
          totalG={cup.totalG}
          pigmentName={cup.pigment?.name ?? null}
          unitSystem={shop.unitSystem}
          scaleResolutionG={shop.scaleResolutionG}
        />
      )}

      {open && (!logged || mixing.startedAtMs !== null) ? (
        <PotLifeClock
          potLifeMin={cup.potLifeMin ?? potLifeMinAt(cup.product, shopTempC)}
          basis={`at ${formatTemperature(shopTempC, shop.unitSystem).text}, the plan's shop temperature${cup.potLifeMin === undefined ? '' : ', this cup’s own heat counted'}`}
          startedAtMs={mixing.startedAtMs}
          cupName={`cup ${cup.order}`}
          onStart={() => {
            mixing.start();
            setLogging(true);
          }}
          onReset={mixing.clear}
        />
      ) : null}

      {logged ? (
        <>
          <LoggedBatch batch={logged} unitSystem={shop.unitSystem} scaleResolutionG={shop.scaleResolutionG} />
          {open && mayVoidEntry(viewer, logged.mixedBy?.id ?? null) ? (
            <div>
              <VoidEntryButton pourId={pourId} kind="batch" id={logged.id} what={`cup ${cup.order}`} />
            </div>
          ) : null}
        </>
      ) : !open ? null : kept ? (
        <p className="font-semibold">
          {kept.state === 'refused'
            ? 'The server did not take this cup: see “Not sent yet” at the top of the page to send it again, change it or discard it.'
            : 'Logged on this phone; it is sent to the server as soon as the connection returns.'}
        </p>
      ) : logging ? (
        <LogBatchForm
          pourId={pourId}
          cup={cup}
          shop={shop}
          mixingStartedAtMs={mixing.startedAtMs}
          onLogged={() => setLogging(false)}
          onCancel={() => setLogging(false)}
        />
      ) : (
        <div>
          <Button variant={isNext ? 'primary' : 'secondary'} className="min-h-12! px-5 text-lg" onClick={() => setLogging(true)}>
            Log this batch
          </Button>
        </div>
      )}
    </section>
  );
}
