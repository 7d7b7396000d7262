import type { UnitSystem } from '@gelpoint/core';
import { useId } from 'react';
import { EmptyState } from '../../../components/ui/EmptyState';
import { Pager } from '../../../components/ui/Pager';
import { QueryResult } from '../../../components/ui/QueryResult';
import { lotUsesPageSize, useLotUses } from '../api/get-lot-uses';
import { LotUsesTable } from './LotUsesTable';

export interface LotUsesProps {
  lotId: string;
  lotNumber: string;
  unitSystem: UnitSystem;
  page: number;
  hrefFor: (page: number) => string;
}

/** Where a lot went: every batch mixed from it, so a piece that did not cure can be traced back, and forward again. */
export function LotUses({ lotId, lotNumber, unitSystem, page, hrefFor }: LotUsesProps) {
  const headingId = useId();
  const uses = useLotUses(lotId, page);
  return (
    <section aria-labelledby={headingId} className="mt-8 flex flex-col gap-3">
      <h2 id={headingId} className="text-xl font-bold text-walnut-900">
        Where this lot went
      </h2>
      <QueryResult query={uses} loadingLabel="Loading the batches mixed from this lot…">
        {(list) =>
          list.total === 0 ? (
            <EmptyState headingLevel={3} title="No batch has used this lot yet">
              Batches logged with this lot number show up here, with the piece and the pour they went into.
            </EmptyState>
          ) : (
            <>
              <p role="status" className="text-ink-soft">
                {list.total === 1 ? '1 batch' : `${list.total} batches`} mixed from this lot, newest first.
              </p>
              <LotUsesTable uses={list.items} unitSystem={unitSystem} lotNumber={lotNumber} />
              <Pager page={page} pageCount={Math.ceil(list.total / lotUsesPageSize)} label="Pages of batches from this lot" hrefFor={hrefFor} />
            </>
          )
        }
      </QueryResult>
    </section>
  );
}
