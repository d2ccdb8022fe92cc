import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { CorrectionCard } from '@/components/corrections/correction-card';
import { SignInPrompt } from '@/components/corrections/sign-in-prompt';
import { Button } from '@/components/ui/button';
import { ChoiceRow } from '@/components/ui/choice-row';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/states';
import { describeError } from '@/lib/api/describe-error';
import { useCorrectionsQuery } from '@/lib/hooks/use-corrections';
import { useModelsQuery } from '@/lib/hooks/use-library';
import { useSession } from '@/lib/session/session-provider';
import { Spacing } from '@/lib/theme';

/** Editors' queue: pending proposals, oldest first, filterable by make. */
export default function ReviewQueueScreen() {
  const session = useSession();
  const router = useRouter();
  const [make, setMake] = useState<string>('');
  const models = useModelsQuery();
  const queue = useCorrectionsQuery({ status: 'pending', make: make || undefined });
  if (session.status === 'signed-out')
    return (
      <Screen>
        <SignInPrompt reason="to review corrections" />
      </Screen>
    );
  if (session.status === 'signed-in' && !session.can('editor'))
    return (
      <Screen>
        <Text variant="heading">Editors only</Text>
      </Screen>
    );
  const makes = [...new Set((models.data ?? []).map((m) => m.make.name))];
  return (
    <Screen testID="review-queue-screen">
      <Text variant="title">Corrections to review</Text>
      <ChoiceRow
        label="Make"
        options={[{ value: '', label: 'All makes' }, ...makes.map((m) => ({ value: m, label: m }))]}
        value={make}
        onChange={setMake}
      />
      {queue.isPending ? (
        <LoadingState label="Loading the queue" />
      ) : queue.error ? (
        <ErrorState message={describeError(queue.error)} onRetry={queue.refetch} />
      ) : queue.data.length === 0 ? (
        <EmptyState message="Nothing waiting. Well done." />
      ) : (
        <View style={styles.list}>
          {queue.data.map((c) => (
            <CorrectionCard key={c.id} c={c} showProposer>
              <Button
                label="Review"
                onPress={() => router.push(`/review/${c.id}`)}
                style={styles.action}
                testID={`review-${c.id}`}
              />
            </CorrectionCard>
          ))}
        </View>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({ list: { gap: Spacing.md }, action: { alignSelf: 'flex-start' } });
