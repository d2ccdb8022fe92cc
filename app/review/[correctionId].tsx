import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { CorrectionCard } from '@/components/corrections/correction-card';
import { FieldComparison } from '@/components/corrections/field-comparison';
import { Button } from '@/components/ui/button';
import { Caution } from '@/components/ui/caution';
import { ChoiceRow } from '@/components/ui/choice-row';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { describeError } from '@/lib/api/describe-error';
import { useCorrectionQuery, useDecideMutation } from '@/lib/hooks/use-corrections';
import { Spacing } from '@/lib/theme';

/** One proposal for an editor: compare, then accept (a new revision) or reject with a note. */
export default function ReviewCorrectionScreen() {
  const { correctionId } = useLocalSearchParams<{ correctionId: string }>();
  const router = useRouter();
  const review = useCorrectionQuery(Number(correctionId));
  const decide = useDecideMutation(Number(correctionId));
  const [note, setNote] = useState('');
  const [confirmed, setConfirmed] = useState(false);
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
          title="the spec changed after this proposal"
          testID="stale-warning"
          lines={[
            `It was proposed against version ${r.baseVersion}; the spec is now at version ${r.currentVersion}.`,
            'Compare the three columns before accepting: accepting applies the proposed values over the current ones.',
          ]}
        />
      ) : null}
      <FieldComparison review={r} />
      {decide.error ? (
        <Text color="fail" accessibilityRole="alert">
          {describeError(decide.error)}
        </Text>
      ) : null}
      {r.status === 'pending' ? (
        <View style={styles.decide}>
          <TextField
            label="Note to the proposer (required to reject)"
            value={note}
            onChangeText={setNote}
            multiline
            testID="decision-note"
          />
          {r.stale ? (
            <ChoiceRow
              label="I have compared the current values"
              options={[{ value: true, label: 'Yes, apply anyway' }]}
              value={confirmed || null}
              onChange={() => setConfirmed(true)}
            />
          ) : null}
          <View style={styles.buttons}>
            <Button
              label="Accept"
              disabled={decide.isPending || (r.stale && !confirmed)}
              testID="accept-button"
              onPress={() => decide.mutate({ accept: true, confirmStale: r.stale, note }, { onSuccess: done, onError })}
            />
            <Button
              label="Reject"
              variant="secondary"
              disabled={decide.isPending || note.trim().length < 3}
              testID="reject-button"
              onPress={() => decide.mutate({ accept: false, note }, { onSuccess: done, onError })}
            />
          </View>
        </View>
      ) : (
        <Text color="textMuted">Decided: {r.status}.</Text>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  decide: { gap: Spacing.md, maxWidth: 640 },
  buttons: { flexDirection: 'row', gap: Spacing.sm },
});
