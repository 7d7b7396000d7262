import { Button } from '../../../components/ui/Button';
import { cx } from '../../../lib/cx';
import { useNow } from '../hooks/use-now';
import { potLifeState } from '../utils/pot-life';

export interface PotLifeClockProps {
  potLifeMin: number;
  /** What the pot life was worked out for, in words ("at 21.0 °C, the plan's shop temperature"). */
  basis: string;
  startedAtMs: number | null;
  onStart: () => void;
  onReset: () => void;
  /** Names the cup for screen readers, e.g. "cup 2". */
  cupName: string;
}

const phaseClasses = {
  running: 'border-walnut-300 bg-white text-walnut-900',
  last_minutes: 'border-resin-500 bg-resin-50 text-resin-700',
  over: 'border-ember-600 bg-ember-50 text-ember-700',
} as const;

/** The pot life of one cup, counted down from the tap on "Start mixing", in digits big enough to read from the bench. */
export function PotLifeClock({ potLifeMin, basis, startedAtMs, onStart, onReset, cupName }: PotLifeClockProps) {
  if (startedAtMs === null) {
    return (
      <div className="flex flex-wrap items-center gap-3">
        <Button className="min-h-12! px-5 text-lg" onClick={onStart}>
          Start mixing
        </Button>
        <p className="text-ink-soft">
          Pot life {Math.round(potLifeMin)} min from the moment A and B meet ({basis}).
        </p>
      </div>
    );
  }
  return <RunningClock potLifeMin={potLifeMin} startedAtMs={startedAtMs} onReset={onReset} cupName={cupName} />;
}

function RunningClock({ potLifeMin, startedAtMs, onReset, cupName }: { potLifeMin: number; startedAtMs: number; onReset: () => void; cupName: string }) {
  const now = useNow(1000);
  const state = potLifeState(startedAtMs, now, potLifeMin);
  return (
    <div className={cx('flex flex-col gap-2 rounded-xl border-2 p-4', phaseClasses[state.phase])}>
      <p className="text-sm font-semibold tracking-wide uppercase">Pot life left, {cupName}</p>
      {/* The digits change every second; only the sentence is announced, and only when the phase changes. */}
      <p className="font-mono text-6xl font-bold tabular-nums sm:text-7xl" aria-hidden="true">
        {state.digits}
      </p>
      <p role="status" className={cx('text-lg', state.phase === 'running' ? 'font-semibold' : 'font-bold')}>
        {state.words}
      </p>
      <div>
        <Button variant="quiet" className="min-h-12!" onClick={onReset}>
          Reset the clock
        </Button>
      </div>
    </div>
  );
}
