import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Button } from './button';
import { Text } from './text';

export function LoadingState({ label }: { label: string }) {
  const t = useTheme();
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
