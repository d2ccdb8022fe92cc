import { StyleSheet, View } from 'react-native';
import type { RunResultDto } from '@/lib/contracts/plans';
import { Spacing } from '@/lib/theme';
import { VerdictChip } from '../jobs/verdict-chip';
import { Text } from '../ui/text';

export type RunHistoryProps = { results: RunResultDto[] };

/** The steps done so far, in order: each with its verdict (or what was seen), and skipped ones with their reason. */
export function RunHistory({ results }: RunHistoryProps) {
  if (results.length === 0) return null;
  return (
    <View style={styles.list} testID="run-history">
      <Text variant="label">Done so far</Text>
      {results.map((r, i) => (
        <View key={r.id} style={styles.row} testID={`result-${r.stepId}`}>
          <Text style={styles.title}>
            {i + 1}. {r.title}
          </Text>
          {r.verdict ? (
            <VerdictChip verdict={r.verdict} />
          ) : (
            <Text variant="label">{r.outcome === 'skipped' ? 'SKIPPED' : 'SEEN'}</Text>
          )}
          <Text variant="small" color="textMuted" style={styles.reason}>
            {r.outcome === 'skipped' ? `Skipped: ${r.skipReason}` : r.reason}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: Spacing.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: Spacing.sm },
  title: { flexGrow: 1, flexBasis: 180 },
  reason: { flexBasis: '100%' },
});
