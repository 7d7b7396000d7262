import type { Member, PourView } from '@gelpoint/contracts';
import { formatMass, type UnitSystem } from '@gelpoint/core';
import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { EmptyState } from '../../../components/ui/EmptyState';
import { FieldError } from '../../../components/ui/Field';
import { FormAlert } from '../../../components/ui/FormAlert';
import { cx } from '../../../lib/cx';
import { errorNotice } from '../../../lib/error-notice';
import { formatDate } from '../../../lib/format';
import type { PlanChoices } from '../api/get-plan-choices';
import { useStartPour } from '../api/start-pour';

export interface StartPourFormProps {
  plans: PlanChoices['items'];
  members: readonly Member[];
  /** Whoever starts the pour is told by default. */
  selfUserId: string;
  preselectedPlanId: string | null;
  unitSystem: UnitSystem;
  onStarted: (pour: PourView) => void;
}

/** Pick the saved plan to pour and who is told when its windows open and close. */
export function StartPourForm({ plans, members, selfUserId, preselectedPlanId, unitSystem, onStarted }: StartPourFormProps) {
  const [planId, setPlanId] = useState<string>(plans.some((p) => p.id === preselectedPlanId) ? preselectedPlanId! : '');
  const [notify, setNotify] = useState<ReadonlySet<string>>(() => new Set([selfUserId]));
  const [planError, setPlanError] = useState<string | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const start = useStartPour({ onSuccess: onStarted });
  const active = members.filter((m) => m.status === 'active');

  if (plans.length === 0) {
    return <EmptyState title="No pour plans yet">A maker plans the pour first: the cavity, the products and the cups. Then it can be started here.</EmptyState>;
  }

  return (
    <form
      noValidate
      aria-label="Start a pour"
      className="flex flex-col gap-6"
      onSubmit={async (event) => {
        event.preventDefault();
        setFormError(null);
        if (!planId) {
          setPlanError('Choose the pour plan to follow.');
          return;
        }
        setPlanError(null);
        try {
          await start.mutateAsync({ pourPlanId: planId, notifyUserIds: [...notify] });
        } catch (error) {
          setFormError(errorNotice(error).message);
        }
      }}
    >
      <FormAlert message={formError} title="The pour was not started" />
      <fieldset className="flex flex-col gap-2" aria-describedby={planError ? 'plan-error' : undefined}>
        <legend className="mb-1 text-lg font-bold text-walnut-900">Pour plan</legend>
        {plans.map((plan) => (
          <label
            key={plan.id}
            className={cx(
              'flex min-h-12 cursor-pointer items-start gap-3 rounded-lg border border-line-strong bg-white px-3 py-3',
              'has-[:checked]:border-walnut-800 has-[:checked]:bg-walnut-50 has-[:checked]:ring-2 has-[:checked]:ring-walnut-800',
            )}
          >
            <input
              type="radio"
              name="pourPlanId"
              value={plan.id}
              checked={planId === plan.id}
              onChange={() => setPlanId(plan.id)}
              className="mt-1 size-5 accent-walnut-800"
            />
            <span className="flex flex-col">
              <span className="font-semibold">{plan.name}</span>
              <span className="text-sm text-ink-soft">
                {formatMass(plan.totalGrams, unitSystem).text} of resin · planned {formatDate(plan.createdAt)}
                {plan.createdBy ? ` by ${plan.createdBy.name}` : ''}
              </span>
            </span>
          </label>
        ))}
        {planError ? <FieldError id="plan-error">{planError}</FieldError> : null}
      </fieldset>
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-lg font-bold text-walnut-900">Who gets the reminders</legend>
        <p className="text-ink-soft">By e-mail and on Today: seal coat tacky, next-layer windows, demold check, ready to machine.</p>
        {active.map((member) => (
          <label key={member.userId} className="flex min-h-12 items-center gap-3">
            <input
              type="checkbox"
              className="size-6 accent-walnut-800"
              checked={notify.has(member.userId)}
              onChange={(event) => {
                const nextSet = new Set(notify);
                if (event.target.checked) nextSet.add(member.userId);
                else nextSet.delete(member.userId);
                setNotify(nextSet);
              }}
            />
            <span>
              {member.name} <span className="text-ink-soft">({member.email})</span>
            </span>
          </label>
        ))}
      </fieldset>
      <div>
        <Button type="submit" className="min-h-12! px-6 text-lg" busy={start.isPending} busyLabel="Starting…">
          Start the pour
        </Button>
      </div>
    </form>
  );
}
