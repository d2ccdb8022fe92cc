import { useState } from 'react';
import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { jobGate } from '@/components/jobs/job-gate';
import { PlanList } from '@/components/plans/plan-list';
import { RunList } from '@/components/plans/run-list';
import { SystemFilter } from '@/components/plans/system-filter';
import { Screen } from '@/components/ui/screen';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/states';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { describeError } from '@/lib/api/describe-error';
import type { System } from '@/lib/contracts/plans';
import { useJobQuery } from '@/lib/hooks/use-jobs';
import { usePlansQuery, useRunsQuery, useStartRunMutation } from '@/lib/hooks/use-plans';
import { useSession } from '@/lib/session/session-provider';

/** From a job: pick a test plan by symptom (the ones that apply to the job's model), or resume a run. */
export default function JobPlansScreen() {
  const { jobId, system: initial } = useLocalSearchParams<{ jobId: string; system?: System }>();
  const id = Number(jobId);
  const router = useRouter();
  const session = useSession();
  const [q, setQ] = useState('');
  const [system, setSystem] = useState<System | null>(initial ?? null);
  const job = useJobQuery(id, session.status === 'signed-in');
  const modelId = job.data?.modelId ?? undefined;
  const plans = usePlansQuery({ modelId, system: system ?? undefined, q }, !!job.data);
  const runs = useRunsQuery(id, session.status === 'signed-in');
  const start = useStartRunMutation(id);

  const gate = jobGate({
    sessionStatus: session.status,
    validId: id > 0,
    query: job,
    loadingLabel: 'Loading the job',
    testID: 'job-plans',
  });
  if (gate || !job.data) return gate;
  const open = (runId: number) => router.push(`/jobs/${id}/runs/${runId}`);
  return (
    <Screen testID="job-plans">
      <Stack.Screen options={{ title: `Diagnose — job #${id}` }} />
      <Text variant="title">What is the symptom?</Text>
      <Text color="textMuted">{job.data.modelTitle ?? job.data.machineLabel}</Text>
      {runs.data?.length ? <RunList runs={runs.data} onOpen={(r) => open(r.id)} /> : null}
      <TextField label="Symptom" value={q} onChangeText={setQ} placeholder="e.g. no spark" testID="plan-symptom" />
      <SystemFilter value={system} onChange={setSystem} />
      {start.error ? <ErrorState message={describeError(start.error)} /> : null}
      {plans.isPending ? (
        <LoadingState label="Loading the test plans" />
      ) : plans.error ? (
        <ErrorState message={describeError(plans.error)} onRetry={plans.refetch} />
      ) : plans.data.length === 0 ? (
        <EmptyState message="No test plan for this symptom and machine." />
      ) : (
        <PlanList
          plans={plans.data}
          actionLabel="Start"
          onOpen={(p) => !start.isPending && start.mutate(p.id, { onSuccess: (run) => open(run.id) })}
        />
      )}
    </Screen>
  );
}
