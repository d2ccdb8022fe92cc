import { Platform, StyleSheet, View, type ViewStyle } from 'react-native';
import { formatNumber } from '@/lib/units';
import type { VerdictResult } from '@/lib/verdict';
import { Radius, Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Text } from '../ui/text';

const WORD = { pass: 'PASS', marginal: 'MARGINAL', fail: 'FAIL' } as const;

// On the web the summary sticks to the bottom of the screen while the reading field is in view (before
// the summary has scrolled up to its place) and to the top while the optional fields below are typed,
// so the verdict stays beside the reading (react-native-web passes `sticky` through to CSS).
const STICKY =
  Platform.OS === 'web' ? ({ position: 'sticky', top: 0, bottom: 0, zIndex: 2 } as unknown as ViewStyle) : null;

/** The verdict word, the value and the plain-words explanation, right under the reading field. */
export function VerdictSummary({ result }: { result: VerdictResult }) {
  const t = useTheme();
  const [fg, bg] = {
    pass: [t.pass, t.passSurface],
    marginal: [t.marginal, t.marginalSurface],
    fail: [t.fail, t.failSurface],
  }[result.verdict];
  return (
    <View
      testID="verdict-summary"
      style={[styles.banner, STICKY, { backgroundColor: bg, borderColor: fg }]}
      accessibilityRole="summary"
      accessibilityLiveRegion="polite"
    >
      <View style={styles.top}>
        <Text variant="title" style={{ color: fg }} testID="verdict-word">
          {WORD[result.verdict]}
        </Text>
        <Text variant="label" testID="verdict-value">
          {result.valueText} {result.unit}
          {result.expandedUncertainty !== null
            ? ` ± ${formatNumber(result.expandedUncertainty, 2)} ${result.unit}`
            : ''}
        </Text>
      </View>
      <Text testID="verdict-explanation">{result.explanation}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  banner: { borderWidth: 2, borderRadius: Radius.lg, padding: Spacing.sm, gap: Spacing.xs },
  top: { flexDirection: 'row', alignItems: 'baseline', gap: Spacing.sm, flexWrap: 'wrap' },
});
