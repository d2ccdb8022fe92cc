import { StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { useSession } from '@/lib/session/session-provider';
import { Spacing } from '@/lib/theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';

/** On a spec card: the ways a signed-in technician can improve the library. */
export function ProposeLinks({ specId }: { specId: number }) {
  const router = useRouter();
  const { status } = useSession();
  return (
    <Card testID="propose-links">
      <Text variant="heading">Something wrong or missing?</Text>
      {status === 'signed-in' ? (
        <View style={styles.row}>
          <Button
            label="Propose a correction"
            variant="secondary"
            onPress={() => router.push(`/corrections/new?specId=${specId}`)}
            testID="propose-correction"
          />
          <Button
            label="Missing spec"
            variant="quiet"
            onPress={() => router.push(`/corrections/new?specId=${specId}&missing=spec`)}
          />
          <Button
            label="Missing component"
            variant="quiet"
            onPress={() => router.push(`/corrections/new?specId=${specId}&missing=component`)}
          />
          <Button label="My proposals" variant="quiet" onPress={() => router.push('/corrections')} />
        </View>
      ) : (
        <Text color="textMuted">
          Sign in to propose a correction with its source; an editor reviews every proposal.
        </Text>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({ row: { flexDirection: 'row', flexWrap: 'wrap', gap: Spacing.sm } });
