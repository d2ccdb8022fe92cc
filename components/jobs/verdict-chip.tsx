import { StyleSheet, View } from 'react-native';
import type { Verdict } from '@/lib/verdict';
import { Radius, Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Text } from '../ui/text';

export type VerdictChipProps = { verdict: Verdict; muted?: boolean; testID?: string };

const WORD = { pass: 'PASS', marginal: 'MARGINAL', fail: 'FAIL' } as const;

/** The verdict as a word on its colour (the word carries the meaning; the colour helps). */
export function VerdictChip({ verdict, muted, testID }: VerdictChipProps) {
  const t = useTheme();
  const [fg, bg] = {
    pass: [t.pass, t.passSurface],
    marginal: [t.marginal, t.marginalSurface],
    fail: [t.fail, t.failSurface],
  }[verdict];
  return (
    <View
      testID={testID}
      style={[styles.chip, { borderColor: muted ? t.border : fg, backgroundColor: muted ? t.surfaceMuted : bg }]}
    >
      <Text variant="label" style={{ color: muted ? t.textMuted : fg }}>
        {WORD[verdict]}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  chip: {
    borderWidth: 1,
    borderRadius: Radius.sm,
    paddingHorizontal: Spacing.sm,
    paddingVertical: 2,
    alignSelf: 'flex-start',
  },
});
