import { StyleSheet, View } from 'react-native';
import { Radius, Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Text } from './text';

export type FormAlertProps = { tone: 'error' | 'success'; message: string; testID?: string };

/** One sentence about the whole form: why it failed, or that it worked. Announced to screen readers. */
export function FormAlert({ tone, message, testID }: FormAlertProps) {
  const t = useTheme();
  const colors =
    tone === 'error'
      ? { bg: t.failSurface, border: t.fail, fg: 'fail' as const }
      : { bg: t.passSurface, border: t.pass, fg: 'text' as const };
  return (
    <View
      // A failure interrupts (alert); a success waits its turn (status, a polite live region).
      role={tone === 'error' ? 'alert' : 'status'}
      testID={testID}
      style={[styles.box, { backgroundColor: colors.bg, borderColor: colors.border }]}
    >
      <Text color={colors.fg}>{message}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 1, borderLeftWidth: 6, borderRadius: Radius.md, padding: Spacing.md },
});
