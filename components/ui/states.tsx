import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { useOnline } from '@/lib/hooks/use-online';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Button } from './button';
import { Text } from './text';

/**
 * A screen's answer on its way. Offline, a query that was never saved on this device waits
 * for the connection (TanStack pauses it): say so instead of spinning.
 */
export function LoadingState({ label }: { label: string }) {
  const t = useTheme();
  const online = useOnline();
  if (!online)
    return (
      <View style={styles.box} accessibilityRole="alert" testID="offline-not-saved">
        <Text>You are offline, and this page was not saved on this device.</Text>
        <Text color="textMuted">It loads by itself when the connection returns.</Text>
      </View>
    );
  return (
    <View style={styles.box} accessibilityRole="progressbar" accessibilityLabel={label}>
      <ActivityIndicator color={t.primary} />
      <Text color="textMuted">{label}…</Text>
    </View>
  );
}

export function ErrorState({ message, onRetry }: { message: string; onRetry?: () => void }) {
  return (
    <View style={styles.box} accessibilityRole="alert">
      <Text color="fail">{message}</Text>
      {onRetry ? <Button label="Try again" variant="secondary" onPress={onRetry} /> : null}
    </View>
  );
}

export function EmptyState({ message }: { message: string }) {
  return (
    <View style={styles.box}>
      <Text color="textMuted">{message}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { paddingVertical: Spacing.xl, alignItems: 'center', gap: Spacing.md },
});
