import { StyleSheet, View } from 'react-native';
import type { JobSummaryDto } from '@/lib/contracts/jobs';
import { Spacing } from '@/lib/theme';
import { Text } from '../ui/text';
import { countsText } from './job-format';

export type VerdictCountsProps = { counts: JobSummaryDto['counts']; testID?: string };

/** "7 pass · 1 marginal · 1 fail", current readings only; failures first to the eye. */
export function VerdictCounts({ counts, testID = 'verdict-counts' }: VerdictCountsProps) {
  const total = counts.pass + counts.marginal + counts.fail;
  return (
    <View
      style={styles.row}
      testID={testID}
      accessibilityRole="summary"
      accessibilityLabel={`Verdicts: ${countsText(counts)}`}
    >
      <Text variant="heading">{total === 0 ? 'No readings yet' : countsText(counts)}</Text>
      {counts.fail > 0 ? (
        <Text variant="label" color="fail">
          {counts.fail === 1 ? '1 reading failed' : `${counts.fail} readings failed`}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ row: { gap: Spacing.xs } });
