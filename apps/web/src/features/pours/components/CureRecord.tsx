import type { Piece, Shop } from '@gelpoint/contracts';
import { formatTemperature, formatWeighedMass, type ScaleResolutionG } from '@gelpoint/core';
import type { ReactNode } from 'react';
import { Alert } from '../../../components/ui/Alert';
import { QrCode } from '../../../components/ui/QrCode';
import { paths } from '../../../config/paths';
import { appLink } from '../../../lib/app-link';
import { formatDateTime } from '../../../lib/format';
import { useRootClass } from '../../../lib/use-root-class';
import type { PieceRecordPour } from '../api/get-piece-record';
import { checkStageWords, pourStatusWords } from '../utils/cure-words';
import { pourRecord, type PourRecord } from '../utils/cure-record';
import { productOfStep, runSheetOf } from '../utils/plan-run-sheet';
import { temperaturePlot, type PlotFrame } from '../utils/temperature-plot';
import { TemperaturePlotView } from './TemperaturePlotView';
import './cure-record.css';

// Low and wide: the plot shares the page with the cups, the checks and the release.
const recordPlotFrame: PlotFrame = { width: 720, height: 170, left: 48, right: 16, top: 12, bottom: 30 };

const cell = 'border border-walnut-300 px-1.5 py-1 align-top';
const head = `${cell} bg-paper-deep text-left font-semibold`;

/** A wide table scrolls sideways on a phone instead of squeezing; on paper it takes the page's width. */
function Scroll({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div role="region" aria-label={label} tabIndex={0} className="overflow-x-auto print:overflow-visible">
      {children}
    </div>
  );
}

function Block({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="cure-record-block flex flex-col gap-1.5">
      <h3 className="text-base font-bold">{title}</h3>
      {children}
    </section>
  );
}

function CupsTable({ record, grams, temp }: { record: PourRecord; grams: (g: number) => string; temp: (c: number) => string }) {
  const planned = (target: number, weighed: number | undefined) =>
    weighed === undefined ? `${grams(target)} planned` : `${grams(weighed)} (plan ${grams(target)})`;
  return (
    <Scroll label="Cups mixed">
      <table className="w-full min-w-[40rem] border-collapse text-sm tabular-nums print:min-w-0">
        <caption className="sr-only">Cups mixed, with lots, weights, who mixed them and when</caption>
        <thead>
          <tr>
            <th scope="col" className={head}>
              Cup
            </th>
            <th scope="col" className={head}>
              Product · lots A / B / pigment
            </th>
            <th scope="col" className={head}>
              Part A
            </th>
            <th scope="col" className={head}>
              Part B
            </th>
            <th scope="col" className={head}>
              Pigment
            </th>
            <th scope="col" className={head}>
              Mixed by, when, air
            </th>
          </tr>
        </thead>
        <tbody>
          {record.cups.map((cup) => {
            const l = cup.logged;
            return (
              <tr key={cup.order} className={l?.voided ? 'line-through' : undefined}>
                <td className={cell}>
                  {cup.order} · {cup.pourLabel}
                </td>
                <td className={cell}>
                  {cup.productName}
                  {l ? ` · ${l.lotA || '—'} / ${l.lotB || '—'}${cup.pigmentName ? ` / ${l.lotPigment || '—'}` : ''}` : ''}
                </td>
                <td className={cell}>{planned(cup.targetAG, l?.weighedAG)}</td>
                <td className={cell}>{planned(cup.targetBG, l?.weighedBG)}</td>
                <td className={cell}>{cup.pigmentName ? planned(cup.targetPigmentG, l?.weighedPigmentG) : 'none'}</td>
                <td className={cell}>
                  {l ? (
                    <>
                      {l.mixedBy ?? 'a former member'}, {formatDateTime(l.mixedAt)}
                      {l.ambientTempC !== null ? `, ${temp(l.ambientTempC)}` : ''}
                      {l.rhPct !== null ? ` ${l.rhPct} % RH` : ''}
                      {l.voided ? ' (voided)' : ''}
                      {l.warnings.length ? <span className="block font-semibold">{l.warnings.join(' ')}</span> : null}
                    </>
                  ) : (
                    'not logged'
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </Scroll>
  );
}

function PourSection({ entry, number, shop, scale }: { entry: PieceRecordPour; number: number; shop: Shop; scale: ScaleResolutionG }) {
  const sheet = runSheetOf(entry.plan);
  if (!sheet.ok) {
    return (
      <Alert tone="error" title={`Pour ${number} cannot be shown`} live="none">
        {sheet.error.message}
      </Alert>
    );
  }
  const { pour } = entry;
  const record = pourRecord(pour, sheet.value);
  const grams = (g: number) => formatWeighedMass(g, shop.unitSystem, scale).text;
  const temp = (c: number) => formatTemperature(c, shop.unitSystem).text;
  const product = productOfStep(sheet.value, pour.cure.step);
  const plot = temperaturePlot({
    readings: pour.readings,
    pouredAt: pour.cure.pouredAt,
    asOf: pour.releasedAt ?? new Date().toISOString(),
    assumedTempC: pour.assumedTempC,
    readingCarryH: shop.readingCarryH,
    product,
    unitSystem: shop.unitSystem,
    frame: recordPlotFrame,
    history: pour.cure.spans,
  });
  const t = record.temperatures;
  return (
    <section className="cure-record-pour flex flex-col gap-3" aria-labelledby={`pour-${pour.id}`}>
      <header className="border-b-2 border-walnut-800 pb-1" data-print-border>
        <h2 id={`pour-${pour.id}`} className="text-lg font-bold">
          Pour {number}: {entry.plan.name}
        </h2>
        <p className="text-sm">
          Started {formatDateTime(pour.startedAt)} · {pourStatusWords[pour.status]} · {pour.batchesLogged} of {pour.batchesPlanned} cups logged · planned at{' '}
          {temp(pour.assumedTempC)}
        </p>
      </header>
      <Block title="Products and lots">
        <ul className="text-sm">
          {record.products.map((p) => (
            <li key={p.role}>
              <strong>{p.role}:</strong> {p.name} — {p.lots.length ? `lots ${p.lots.join(', ')}` : 'no lot logged'}
            </li>
          ))}
        </ul>
      </Block>
      <Block title="Cups">
        <CupsTable record={record} grams={grams} temp={temp} />
      </Block>
      <Block title="Temperatures">
        {t ? (
          <p className="text-sm">
            {t.count === 1 ? '1 reading' : `${t.count} readings`} from {formatDateTime(t.firstAt)} to {formatDateTime(t.lastAt)}: lowest {temp(t.minC)} (
            {formatDateTime(t.minAt)}), highest {temp(t.maxC)} ({formatDateTime(t.maxAt)}).
          </p>
        ) : (
          <p className="text-sm">No temperature was logged; the cure was counted at the plan’s {temp(pour.assumedTempC)}.</p>
        )}
        {plot && t ? <TemperaturePlotView plot={plot} minimumLabel={`minimum ${temp(product.minWorkTempC)}`} /> : null}
      </Block>
      <Block title="Cure checks">
        {record.checks.length === 0 ? (
          <p className="text-sm">None recorded.</p>
        ) : (
          <Scroll label="Cure checks recorded">
            <table className="w-full min-w-[32rem] border-collapse text-sm print:min-w-0">
              <caption className="sr-only">Cure checks</caption>
              <thead>
                <tr>
                  <th scope="col" className={head}>
                    When
                  </th>
                  <th scope="col" className={head}>
                    Stage
                  </th>
                  <th scope="col" className={head}>
                    Shore D
                  </th>
                  <th scope="col" className={head}>
                    By
                  </th>
                  <th scope="col" className={head}>
                    Note
                  </th>
                </tr>
              </thead>
              <tbody>
                {record.checks.map((c) => (
                  <tr key={c.id}>
                    <td className={cell}>{formatDateTime(c.checkedAt)}</td>
                    <td className={cell}>{checkStageWords[c.stage]}</td>
                    <td className={`${cell} tabular-nums`}>{c.hardnessShoreD ?? '—'}</td>
                    <td className={cell}>{c.checkedBy?.name ?? 'a former member'}</td>
                    <td className={cell}>{c.note || '—'}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </Scroll>
        )}
      </Block>
      <Block title="Release">
        <p className="text-sm">
          {record.release
            ? `Released for machining by ${record.release.by ?? 'a former member'} on ${formatDateTime(record.release.at)}.`
            : 'Not released for machining yet.'}
          {record.machinedAt ? ` Machined on ${formatDateTime(record.machinedAt)}.` : ''}
        </p>
      </Block>
    </section>
  );
}

export interface CureRecordProps {
  piece: Piece;
  pours: readonly PieceRecordPour[];
  shop: Shop;
}

/** One piece's cure record: each pour's plan, products, lots and weights per cup, temperatures, checks and release. */
export function CureRecord({ piece, pours, shop }: CureRecordProps) {
  useRootClass('print-cure-record');
  const scale: ScaleResolutionG = shop.scaleResolutionG === 1 ? 1 : 0.1;
  return (
    <div className="cure-record relative flex flex-col gap-5">
      {/* The piece's code in the corner: scanned from the printed record (or the piece's label), it opens the piece. */}
      <QrCode value={appLink(paths.piece.getHref(piece.id))} label={`QR code: opens the piece ${piece.name}`} sizePx={80} className="absolute top-0 right-0" />
      <header className="flex flex-col gap-0.5 pr-24">
        <p className="text-sm font-semibold tracking-wide uppercase">Cure record · {shop.name}</p>
        <h1 className="text-2xl font-bold">{piece.name}</h1>
        <p className="text-sm">
          {piece.wood ? `${piece.wood} · ` : ''}
          {pours.length === 1 ? '1 pour' : `${pours.length} pours`} · printed {formatDateTime(new Date().toISOString())}
        </p>
      </header>
      {pours.length === 0 ? <p>No pour of this piece has started yet: the record fills in as cups are logged.</p> : null}
      {pours.map((entry, i) => (
        <PourSection key={entry.pour.id} entry={entry} number={i + 1} shop={shop} scale={scale} />
      ))}
    </div>
  );
}
