import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { PlanProposalForm } from '@/components/corrections/plan-proposal-form';
import { SignInPrompt } from '@/components/corrections/sign-in-prompt';
import { Screen } from '@/components/ui/screen';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { Text } from '@/components/ui/text';
import { describeError } from '@/lib/api/describe-error';
import type { ProposeBody } from '@/lib/contracts/corrections';
import { planJsonText } from '@/lib/plans/plan-json';
import { useProposeMutation } from '@/lib/hooks/use-corrections';
import { usePlanQuery } from '@/lib/hooks/use-plans';
import { useSession } from '@/lib/session/session-provider';

/** A contributor's proposed change to a test plan, pre-filled with the plan as it is now. */
export default function ProposePlanChangeScreen() {
  const { planId } = useLocalSearchParams<{ planId: string }>();
  const router = useRouter();
  const session = useSession();
  const plan = usePlanQuery(Number(planId));
  const propose = useProposeMutation();
  if (session.status !== 'signed-in')
    return (
      <Screen>
        <SignInPrompt reason="to propose a change to a test plan" />
      </Screen>
    );
  if (plan.isPending)
    return (
      <Screen>
        <LoadingState label="Loading the test plan" />
      </Screen>
    );
  if (plan.error)
    return (
      <Screen>
        <ErrorState message={describeError(plan.error)} onRetry={plan.refetch} />
      </Screen>
    );
  const p = plan.data;
  const c = p.citation;
  return (
    <Screen testID="propose-plan-screen">
      <Stack.Screen options={{ title: 'Propose a change to a test plan' }} />
      <Text variant="title">Propose a change to “{p.title}”</Text>
      <Text color="textMuted">
        Change the steps below (add, remove or reword them), then name the source that backs the change. An editor
        checks it before the plan changes; you will be told the decision by e-mail and under “My proposals”.
      </Text>
      <PlanProposalForm
        initialJson={planJsonText(p, { citation: false })}
        initial={{ title: c.title, edition: c.edition ?? '', page: c.page ?? '', url: c.url ?? '', rationale: '' }}
        submitLabel="Send the proposal"
        pending={propose.isPending}
        error={propose.error}
        onSubmit={({ plan: fields, citation, rationale }) =>
          propose.mutate(
            { kind: 'plan_change', planId: p.id, version: p.version, plan: fields, citation, rationale } as ProposeBody,
            { onSuccess: () => router.replace('/corrections') },
          )
        }
      />
    </Screen>
  );
}
