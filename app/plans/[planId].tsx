import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { PlanSteps } from '@/components/plans/plan-steps';
import { StartOnJob } from '@/components/plans/start-on-job';
import { Button } from '@/components/ui/button';
import { MainAndSide } from '@/components/ui/main-and-side';
import { Screen } from '@/components/ui/screen';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { Text } from '@/components/ui/text';
import { describeError } from '@/lib/api/describe-error';
import { SYSTEM_LABELS } from '@/lib/contracts/plans';
import { useJobsQuery } from '@/lib/hooks/use-jobs';
import { usePlanQuery } from '@/lib/hooks/use-plans';
import { useSession } from '@/lib/session/session-provider';

/** One test plan: its steps in order, and (signed in) starting it on one of your open jobs. */
export default function PlanScreen() {
  const { planId } = useLocalSearchParams<{ planId: string }>();
  const id = Number(planId);
  const router = useRouter();
  const session = useSession();
  const plan = usePlanQuery(id);
  const jobs = useJobsQuery({ status: 'open' }, session.status === 'signed-in');
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
  const fitting = (jobs.data ?? []).filter((j) => p.modelId === null || j.modelId === p.modelId);
  return (
    <Screen testID="plan-screen">
      <Stack.Screen options={{ title: p.title }} />
      <Text variant="title">{p.title}</Text>
      <Text>{p.symptom}</Text>
      <Text variant="small" color="textMuted">
        {SYSTEM_LABELS[p.system]} · {p.modelTitle ?? 'every model with these parts'} · version {p.version} · source:{' '}
        {p.citation.title}
        {p.citation.edition ? `, ${p.citation.edition}` : ''}
      </Text>
      <MainAndSide
        main={<PlanSteps steps={p.steps} />}
        side={
          session.status === 'signed-in' ? (
            <StartOnJob
              jobs={fitting}
              onStarted={(jobId, runId) => router.push(`/jobs/${jobId}/runs/${runId}`)}
              planId={p.id}
            />
          ) : (
            <Text color="textMuted">Sign in to run this plan on a job or to propose a change to it.</Text>
          )
        }
      />
      {session.status === 'signed-in' ? (
        <Button
          label="Propose a change to this plan"
          variant="secondary"
          onPress={() => router.push(`/corrections/new-plan?planId=${p.id}`)}
          testID="propose-plan-change"
        />
      ) : null}
    </Screen>
  );
}
