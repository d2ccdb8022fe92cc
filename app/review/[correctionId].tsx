import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { CorrectionCard } from '@/components/corrections/correction-card';
import { DecisionForm } from '@/components/corrections/decision-form';
import { FieldComparison } from '@/components/corrections/field-comparison';
import { PlanChangeView } from '@/components/corrections/plan-change-view';
import { Caution } from '@/components/ui/caution';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { describeError } from '@/lib/api/describe-error';
import { useCorrectionQuery, useDecideMutation } from '@/lib/hooks/use-corrections';

/** One proposal for an editor: compare, then accept (a new revision) or reject with a note. */
export default function ReviewCorrectionScreen() {
  const { correctionId } = useLocalSearchParams<{ correctionId: string }>();
  const router = useRouter();
  const review = useCorrectionQuery(Number(correctionId));
  const decide = useDecideMutation(Number(correctionId));
  if (review.isPending)
    return (
      <Screen>
        <LoadingState label="Loading the proposal" />
      </Screen>
    );
  if (review.error)
    return (
      <Screen>
        <ErrorState message={describeError(review.error)} onRetry={review.refetch} />
      </Screen>
    );
  const r = review.data;
  const what = r.kind === 'plan_change' ? 'plan' : 'spec';
  const done = () => {
    void review.refetch();
    if (router.canGoBack()) router.back();
    else router.replace('/review');
  };
  const onError = () => {
    void review.refetch();
  };
  return (
    <Screen testID="review-screen">
      <Stack.Screen options={{ title: `Correction #${r.id}` }} />
      <CorrectionCard c={r} showProposer />
      {r.stale ? (
        <Caution
          title={`the ${what} changed after this proposal`}
          testID="stale-warning"
          lines={[
            `It was proposed against version ${r.baseVersion}; the ${what} is now at version ${r.currentVersion}.`,
            r.kind === 'plan_change'
              ? 'Read what accepting would change in the current version before accepting: the proposed fields replace the current ones.'
              : 'Compare the three columns before accepting: accepting applies the proposed values over the current ones.',
          ]}
        />
      ) : null}
      {r.kind === 'plan_change' ? (
        <PlanChangeView plan={r.plan} baseVersion={r.baseVersion} currentVersion={r.currentVersion} />
      ) : (
        <FieldComparison review={r} />
      )}
      {decide.error ? (
        <Text color="fail" accessibilityRole="alert">
          {describeError(decide.error)}
        </Text>
      ) : null}
      {r.status === 'pending' ? (
        <DecisionForm
          stale={r.stale}
          pending={decide.isPending}
          onAccept={(b) => decide.mutate({ accept: true, ...b }, { onSuccess: done, onError })}
          onReject={(b) => decide.mutate({ accept: false, ...b }, { onSuccess: done, onError })}
        />
      ) : (
        <Text color="textMuted">Decided: {r.status}.</Text>
      )}
    </Screen>
  );
}
