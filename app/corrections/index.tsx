import { StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { CorrectionCard } from '@/components/corrections/correction-card';
import { SignInPrompt } from '@/components/corrections/sign-in-prompt';
import { Button } from '@/components/ui/button';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/states';
import { describeError } from '@/lib/api/describe-error';
import { useCorrectionsQuery, useWithdrawMutation } from '@/lib/hooks/use-corrections';
import { useSession } from '@/lib/session/session-provider';
import { Spacing } from '@/lib/theme';

export default function MyProposalsScreen() {
  const session = useSession();
  const router = useRouter();
  const list = useCorrectionsQuery({ mine: true });
  const withdraw = useWithdrawMutation();
  if (session.status === 'signed-out')
    return (
      <Screen>
        <SignInPrompt reason="to see your proposals" />
      </Screen>
    );
  return (
    <Screen testID="my-proposals-screen">
      <Text variant="title">My proposals</Text>
      <Text color="textMuted">Corrections you sent, with the editors’ decisions. Pending ones can be withdrawn.</Text>
      {withdraw.error ? <Text color="fail">{describeError(withdraw.error)}</Text> : null}
      {list.isPending ? (
        <LoadingState label="Loading your proposals" />
      ) : list.error ? (
        <ErrorState message={describeError(list.error)} onRetry={list.refetch} />
      ) : list.data.length === 0 ? (
        <EmptyState message="No proposals yet. Open any spec and choose “Propose a correction”." />
      ) : (
        <View style={styles.list}>
          {list.data.map((c) => (
            <CorrectionCard key={c.id} c={c}>
              {c.status === 'pending' ? (
                <View style={styles.actions}>
                  <Button label="Edit" variant="secondary" onPress={() => router.push(`/corrections/${c.id}`)} />
                  <Button
                    label="Withdraw"
                    variant="secondary"
                    disabled={withdraw.isPending}
                    onPress={() => withdraw.mutate(c.id)}
                  />
                </View>
              ) : null}
            </CorrectionCard>
          ))}
        </View>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({ list: { gap: Spacing.md }, actions: { flexDirection: 'row', gap: Spacing.sm } });
