import { can, type PourSummary, type Role } from '@gelpoint/contracts';
import { TextLink } from '../../../components/ui/TextLink';
import { paths } from '../../../config/paths';
import { nextEvent } from '../utils/cure-progress';
import { pourStatusWords, stageAheadWords, stageReachedWords, stepWords } from '../utils/cure-words';
import { CureEvidence } from './CureEvidence';
import { CureProgressBar } from './CureProgressBar';
import { CureStageIcon } from './CureStageIcon';
import { RelativeTime } from './RelativeTime';
import { ReleaseButton } from './ReleaseButton';

/** Every pour on the board as a card: the piece, its stage, its progress and what comes next. */
export function CureBoardList({ pours, role }: { pours: readonly PourSummary[]; role: Role }) {
  return (
    <ul className="grid gap-4 lg:grid-cols-2" aria-label="Pours">
      {pours.map((pour) => {
        const next = nextEvent(pour.cure, pour.nextReminder, pour.status);
        const step = stepWords(pour.cure.step);
        return (
          <li key={pour.id} className="flex flex-col gap-3 rounded-xl border border-line bg-white p-4 shadow-sm">
            <div className="flex flex-wrap items-start justify-between gap-2">
              <div className="min-w-0">
                <h2 className="text-xl font-bold text-walnut-900">
                  <TextLink to={paths.pour.getHref(pour.id)}>{pour.piece.name}</TextLink>
                </h2>
                <p className="text-ink-soft">
                  {pour.planName}
                  {step ? ` · ${step}` : ''} · {pour.batchesLogged} of {pour.batchesPlanned} cups logged
                </p>
              </div>
              <span className="rounded-full border border-walnut-300 bg-paper px-2.5 py-1 text-sm font-semibold text-walnut-800">
                {pourStatusWords[pour.status]}
              </span>
            </div>
            <p className="flex items-center gap-2 text-lg font-semibold">
              <CureStageIcon stage={pour.cure.stageReached} />
              {stageReachedWords(pour.cure.stageReached)}
            </p>
            <CureProgressBar cure={pour.cure} label={`Cure of ${pour.piece.name}`} />
            {pour.flags.length > 0 ? (
              <ul aria-label={`What needs a look on ${pour.piece.name}`} className="flex flex-wrap gap-2">
                {pour.flags.map((flag) => (
                  <li
                    key={flag.code}
                    className="inline-flex items-center gap-1 rounded-full border border-ember-600 bg-ember-50 px-2.5 py-0.5 text-sm font-semibold text-ember-700"
                  >
                    <span aria-hidden="true">!</span> {flag.message}
                  </li>
                ))}
              </ul>
            ) : null}
            {next ? (
              <p>
                Next: <strong>{next.source === 'reminder' ? next.title : stageAheadWords(next.key)}</strong> <RelativeTime iso={next.at} />
                {next.source === 'reminder' && next.assumed ? <span className="text-ink-soft"> (assumed temperature)</span> : null}
              </p>
            ) : null}
            <CureEvidence cure={pour.cure} open={pour.status === 'open'} />
            {pour.cure.release.allowed && pour.status === 'open' ? (
              can(role, 'pour:release') ? (
                <div>
                  <ReleaseButton pourId={pour.id} pieceName={pour.piece.name} />
                </div>
              ) : (
                <p className="font-semibold text-moss-700">Ready to machine: the shop lead can release it.</p>
              )
            ) : null}
          </li>
        );
      })}
    </ul>
  );
}
