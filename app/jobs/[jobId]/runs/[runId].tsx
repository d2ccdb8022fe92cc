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
import { useRunQuery, useStepBackMutation } from '@/lib/hooks/use-plans';
import { useRunAnswer } from '@/lib/hooks/use-run-answer';
import { useSession } from '@/lib/session/session-provider';
import { Spacing } from '@/lib/theme';

export default function PlanRunScreen() {
  const { jobId, runId } = useLocalSearchParams<{ jobId: string; runId: string }>();
  const job = Number(jobId);
  const id = Number(runId);
  const router = useRouter();
  const session = useSession();
  const run = useRunQuery(job, id, session.status === 'signed-in');
  const back = useStepBackMutation(job, id);
  const answer = useRunAnswer(job, id, run.data);

  const gate = jobGate({
    sessionStatus: session.status,
    validId: job > 0 && id > 0,
    query: run,
    loadingLabel: 'Loading the test plan',
    testID: 'plan-run',
  });
  if (gate || !answer.run) return gate;

  const r = answer.run;
  const step = r.currentStep;
  const lastShown = r.results.at(-1);
  const last = answer.last && lastShown?.stepId === answer.last.result.stepId ? answer.last : null;
  const pending = answer.sending || back.isPending;
  const failure = answer.failure ?? (back.error ? describeError(back.error) : null);
  const send = (body: Omit<RunResultBody, 'stepId'>) => void answer.submit(body);
  const findingStep = r.finding
    ? (r.results.find((x) => x.stepId === r.finding!.stepId)?.title ?? r.finding.stepId)
    : '';

  const main = (
    <View style={styles.col}>
      <Text variant="small" color="textMuted">
        {r.symptom}
      </Text>
      {last ? (
        <Card testID="last-result">
          <View style={styles.row}>
            <Text variant="label">{last.result.title}</Text>
            {last.result.verdict ? <VerdictChip verdict={last.result.verdict} /> : null}
          </View>
          <Text variant="small">{last.result.reason}</Text>
        </Card>
      ) : null}
      {r.waiting > 0 ? (
        <Text variant="label" testID="run-waiting" accessibilityRole="alert">
          {r.waiting === 1 ? '1 step result' : `${r.waiting} step results`} judged on this device, waiting to be sent —
          the server judges {r.waiting === 1 ? 'it' : 'them'} again when the connection returns.
        </Text>
      ) : null}
      {answer.refused.map((x) => (
        <Card key={x.key} testID="run-refused">
          <Text variant="label" color="fail">
            Not saved: {x.title}
          </Text>
          <Text variant="small">{x.message}</Text>
          <Button label="Dismiss" variant="quiet" onPress={() => answer.dismiss(x.key)} />
        </Card>
      ))}
      {failure ? (
        <Text color="fail" accessibilityRole="alert">
          {failure}
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
            label={r.waiting > 0 ? 'Back one step (once sent)' : 'Back one step'}
            variant="secondary"
            disabled={pending || r.waiting > 0}
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
