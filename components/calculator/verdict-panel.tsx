import { StyleSheet, View } from 'react-native';
import * as Clipboard from 'expo-clipboard';
import { useState } from 'react';
import { formatNumber, type CanonicalUnit } from '@/lib/units';
import type { VerdictResult } from '@/lib/verdict';
import { explainVerdict } from '@/lib/calculator/explain';
import { Radius, Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Button } from '../ui/button';
import { Text } from '../ui/text';
import { BandPicture } from './band-picture';

const WORD = { pass: 'PASS', marginal: 'MARGINAL', fail: 'FAIL' } as const;

/** The verdict in words, the band picture and the working, copyable for the job notes. */
export function VerdictPanel({ result }: { result: VerdictResult }) {
  const t = useTheme();
  const [copied, setCopied] = useState(false);
  const colors = {
    pass: [t.pass, t.passSurface],
    marginal: [t.marginal, t.marginalSurface],
    fail: [t.fail, t.failSurface],
  }[result.verdict];
  const copy = async () => {
    await Clipboard.setStringAsync(explainVerdict(result));
    setCopied(true);
  };
  return (
    <View testID="verdict-panel" style={styles.panel}>
      <View
        style={[styles.banner, { backgroundColor: colors[1], borderColor: colors[0] }]}
        accessibilityRole="summary"
        accessibilityLiveRegion="polite"
      >
        <Text variant="title" style={{ color: colors[0] }} testID="verdict-word">
          {WORD[result.verdict]}
        </Text>
        <Text variant="label">
          {formatNumber(result.value)} {result.unit}
          {result.expandedUncertainty !== null
            ? ` ± ${formatNumber(result.expandedUncertainty, 2)} ${result.unit} (k = 2)`
            : ''}
          {result.conformanceProbability !== null
            ? ` · ${(result.conformanceProbability * 100).toFixed(1)} % likely within spec`
            : ''}
        </Text>
        <Text testID="verdict-reason">{result.reason}</Text>
      </View>
      <BandPicture result={result} />
      <View testID="verdict-steps" style={styles.steps}>
        <Text variant="heading">Working</Text>
        {result.steps.map((s, i) => (
          <View key={`${i}-${s.label}`} style={[styles.step, { borderTopColor: t.border }]}>
            <Text variant="label">
              {i + 1}. {s.label}
            </Text>
            {s.formula ? (
              <Text variant="small" color="textMuted" selectable>
                {s.formula}
              </Text>
            ) : null}
            <Text variant="small" selectable>
              = {formatNumber(s.value, 6)}
              {s.unit ? ` ${s.unit as CanonicalUnit}` : ''}
            </Text>
          </View>
        ))}
        <Button label={copied ? 'Working copied' : 'Copy the working'} variant="secondary" onPress={copy} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: Spacing.md },
  banner: { borderWidth: 2, borderRadius: Radius.lg, padding: Spacing.md, gap: Spacing.xs },
  steps: { gap: Spacing.sm },
  step: { borderTopWidth: StyleSheet.hairlineWidth, paddingTop: Spacing.xs, gap: 2 },
});
