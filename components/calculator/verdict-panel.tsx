import { StyleSheet, View } from 'react-native';
import * as Clipboard from 'expo-clipboard';
import { useState } from 'react';
import { formatNumber, type CanonicalUnit } from '@/lib/units';
import type { VerdictResult } from '@/lib/verdict';
import { explainVerdict } from '@/lib/calculator/explain';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Button } from '../ui/button';
import { Text } from '../ui/text';
import { BandPicture } from './band-picture';

/** The band picture, then the formal working (reason, ILAC zones, p_c, every step) behind "Show the working". */
export function VerdictPanel({ result }: { result: VerdictResult }) {
  const t = useTheme();
  const [open, setOpen] = useState(false);
  const [copied, setCopied] = useState(false);
  const copy = async () => {
    await Clipboard.setStringAsync(explainVerdict(result));
    setCopied(true);
  };
  return (
    <View testID="verdict-panel" style={styles.panel}>
      <BandPicture result={result} />
      {result.conformanceProbability !== null ? (
        <Text variant="small" color="textMuted">
          {`${(result.conformanceProbability * 100).toFixed(1)} % likely within spec (k = 2)`}
        </Text>
      ) : null}
      <Button
        label={open ? 'Hide the working' : 'Show the working'}
        variant="secondary"
        onPress={() => setOpen(!open)}
        testID="show-working"
      />
      {open ? (
        <View testID="verdict-steps" style={styles.steps}>
          <Text testID="verdict-reason">{result.reason}</Text>
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
              {s.formula?.includes('=') ? null : (
                <Text variant="small" selectable>
                  = {formatNumber(s.value, 6)}
                  {s.unit ? ` ${s.unit as CanonicalUnit}` : ''}
                </Text>
              )}
            </View>
          ))}
          <Button label={copied ? 'Working copied' : 'Copy the working'} variant="secondary" onPress={copy} />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: Spacing.md },
  steps: { gap: Spacing.sm },
  step: { borderTopWidth: StyleSheet.hairlineWidth, paddingTop: Spacing.xs, gap: 2 },
});
