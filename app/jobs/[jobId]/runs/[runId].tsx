import { StyleSheet, View } from 'react-native';
import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { jobGate } from '@/components/jobs/job-gate';
import { VerdictChip } from '@/components/jobs/verdict-chip';
import { FindingCard } from '@/components/plans/finding-card';
import { StepCheck } from '@/components/plans/step-check';
import { RunHistory } from '@/components/plans/run-history';
import { StepView } from '@/components/plans/step-view';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { MainAndSide } from '@/components/ui/main-and-side';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { describeError } from '@/lib/api/describe-error';
import type { RunResultBody } from '@/lib/contracts/plans';
import { useAnswerStepMutation, useRunQuery } from '@/lib/hooks/use-plans';
import { newIdempotencyKey } from '@/lib/offline/reading-queue';
import { useSession } from '@/lib/session/session-provider';
import { Spacing } from '@/lib/theme';

export default function PlanRunScreen() {
  const { jobId, runId } = useLocalSearchParams<{ jobId: string; runId: string }>();
  const job = Number(jobId);
  const id = Number(runId);
  const router = useRouter();
  const session = useSession();
  const run = useRunQuery(job, id, session.status === 'signed-in');
  const { answer, back } = useAnswerStepMutation(job, id);

  const gate = jobGate({
    sessionStatus: session.status,
    validId: job > 0 && id > 0,
    query: run,
    loadingLabel: 'Loading the test plan',
    testID: 'plan-run',
  });
  if (gate || !run.data) return gate;

  const r = run.data;
  const step = r.currentStep;
  const last = answer.data?.judged ?? null;
  const pending = answer.isPending || back.isPending;
  const failure = answer.error ?? back.error;
  const send = (body: Omit<RunResultBody, 'stepId'>) =>
    step && answer.mutate({ body: { ...body, stepId: step.id } as RunResultBody, key: newIdempotencyKey() });
  const findingStep = r.finding
    ? (r.results.find((x) => x.stepId === r.finding!.stepId)?.title ?? r.finding.stepId)
    : '';

  const main = (
    <View style={styles.col}>
      <Text variant="small" color="textMuted">
        {r.symptom}
      </Text>
      {last && r.results.at(-1)?.id === last.id ? (
        <Card testID="last-result">
          <View style={styles.row}>
            <Text variant="label">{last.title}</Text>
            {last.verdict ? <VerdictChip verdict={last.verdict} /> : null}
          </View>
          <Text variant="small">{last.reason}</Text>
        </Card>
      ) : null}
      {failure ? (
        <Text color="fail" accessibilityRole="alert">
          {describeError(failure)}
        </Text>
      ) : null}
      {step ? (
        <>
          <StepView step={step} total={r.stepCount} />
          <StepCheck step={step} pending={pending} onSubmit={send} />
        </>
      ) : r.finding ? (
        <FindingCard finding={r.finding} stepTitle={findingStep} />
      ) : null}
      <View style={styles.row}>
        {r.results.length > 0 ? (
          <Button
            label="Back one step"
            variant="secondary"
            disabled={pending}
            onPress={() => back.mutate()}
            testID="run-back"
          />
        ) : null}
        <Button label="Job sheet" variant="quiet" onPress={() => router.push(`/jobs/${job}`)} />
        {r.finding ? (
          <Button label="Customer report" onPress={() => router.push(`/jobs/${job}/report`)} testID="run-report" />
        ) : null}
      </View>
    </View>
  );
  return (
    <Screen testID="plan-run">
      <Stack.Screen options={{ title: r.title }} />
      <MainAndSide main={main} side={<RunHistory results={r.results} />} />
    </Screen>
  );
}

const styles = StyleSheet.create({
  col: { gap: Spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: Spacing.sm, alignItems: 'center' },
});
