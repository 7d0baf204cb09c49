// The next-step bar wired up: reads the window's runs (for those who may), takes the step or opens its screen.
// The window page, the impact screen and the plans screens all show it, so the next step is one press from each.
import { useRouter } from 'expo-router';
import type { Me } from '@/shared/api';
import { canReadPlans } from '@/shared/permissions';
import type { Window } from '@/shared/windows';
import { useWindowPlansQuery } from '@/hooks/queries/plans';
import { useSubmitForSignoffMutation } from '@/hooks/queries/signoff';
import { useWindowAssessMutation, useWindowTransitionMutation } from '@/hooks/queries/windows';
import { nextStep, type NextStepAction } from '@/components/windows/next-step';
import { NextStepBar } from '@/components/windows/next-step-bar';

/** The screen the bar sits on; a step that would only open this same screen shows no button. */
export type NextStepHere = { screen: 'window' } | { screen: 'impact' } | { screen: 'plans' } | { screen: 'plan'; planId: string };

type Props = { window: Window; me: Me; here: NextStepHere };

function leadsHere(action: NextStepAction, here: NextStepHere): boolean {
  if (action.kind === 'open-plans') return here.screen === 'plans';
  if (action.kind === 'open-plan') return here.screen === 'plan' && here.planId === action.planId;
  return false;
}

export function WindowNextStep({ window: w, me, here }: Props) {
  const router = useRouter();
  const reader = canReadPlans(me.roles);
  const plans = useWindowPlansQuery(w.id, reader);
  const assess = useWindowAssessMutation(w.id);
  const submit = useSubmitForSignoffMutation(w.id);
  const transition = useWindowTransitionMutation(w.id);
  const step = nextStep(me.roles, w, reader ? plans.data?.plans ?? null : null);
  if (!step) return null;
  const base = `/windows/${encodeURIComponent(w.id)}`;
  const act = (action: NextStepAction) => {
    switch (action.kind) {
      case 'assess':
        assess.mutate(w.version, { onSuccess: () => { if (here.screen !== 'impact') router.push(`${base}/impact`); } });
        return;
      case 'open-plans': router.push(`${base}/plans`); return;
      case 'open-plan': router.push(`${base}/plans/${encodeURIComponent(action.planId)}`); return;
      case 'open-signoff': router.push(`/sign-off/${encodeURIComponent(w.id)}`); return;
      case 'submit': submit.mutate(); return;
      case 'transition': transition.mutate({ to: action.to, version: w.version }); return;
    }
  };
  const mailed = submit.data?.approversMailed;
  const error = assess.error ?? submit.error ?? transition.error;
  return (
    <NextStepBar
      step={step}
      showButton={step.action !== null && !leadsHere(step.action, here)}
      busy={assess.isPending || submit.isPending || transition.isPending}
      error={error ? `Not done: ${error.message}` : null}
      done={mailed === undefined ? null : `Sent for sign-off: ${mailed} ${mailed === 1 ? 'approver was' : 'approvers were'} e-mailed.`}
      onAct={() => { if (step.action) act(step.action); }}
    />
  );
}
