import { StyleSheet, View } from 'react-native';
import type { ReadingDto } from '@/lib/contracts/jobs';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Text } from '../ui/text';
import { formatWhen, inputLines, limitsText, resultText, stepText } from './job-format';
import { VerdictChip } from './verdict-chip';

export type ReportReadingProps = { reading: ReadingDto; index: number };

/** A current reading on the printed report: what, the limits and their source, the verdict and the working. */
export function ReportReading({ reading: r, index }: ReportReadingProps) {
  const t = useTheme();
  return (
    <View testID={`report-reading-${r.id}`} style={[styles.block, { borderTopColor: t.border }]}>
      <View style={styles.top}>
        <Text variant="label" style={styles.grow}>
          {index}. {r.label}
        </Text>
        <VerdictChip verdict={r.verdict} />
      </View>
      <Text variant="small">
        Spec: {limitsText(r.specLimits)}
        {r.citation ? ` · Source: ${r.citation}` : ' · Limits typed by the technician'}
      </Text>
      <Text variant="label">
        Result {resultText(r)}
        {r.expandedUncertainty !== null ? ' (k = 2)' : ''}: {r.verdict.toUpperCase()}
      </Text>
      <Text variant="small">{r.reason}</Text>
      <Text variant="small" color="textMuted">
        {[...inputLines(r.inputs), `Taken ${formatWhen(r.takenAt)}`].join(' · ')}
      </Text>
      {r.specChangedSince ? (
        <Text variant="small" color="caution">
          Note: the library’s spec was edited after this reading was judged.
        </Text>
      ) : null}
      <View style={styles.steps}>
        {r.steps.map((s, i) => (
          <Text key={`${i}-${s.label}`} variant="small">
            {i + 1}. {stepText(s)}
          </Text>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  block: { borderTopWidth: StyleSheet.hairlineWidth, paddingTop: Spacing.sm, gap: 3 },
  top: { flexDirection: 'row', gap: Spacing.sm, alignItems: 'center' },
  grow: { flex: 1 },
  steps: { paddingLeft: Spacing.md, gap: 1 },
});
