import { StyleSheet, View } from 'react-native';
import type { ReadingDto } from '@/lib/contracts/jobs';
import { Spacing } from '@/lib/theme';
import { Text } from '../ui/text';
import { formatWhen, resultText } from './job-format';

export type SupersededListProps = { readings: ReadingDto[] };

/** Readings that were re-taken: kept on the record, struck through, with what replaced them. */
export function SupersededList({ readings }: SupersededListProps) {
  if (readings.length === 0) return null;
  return (
    <View style={styles.list} testID="report-superseded">
      <Text variant="heading">Re-taken readings</Text>
      <Text variant="small" color="textMuted">
        Kept for the record; each was replaced by the reading named beside it.
      </Text>
      {readings.map((r) => (
        <Text key={r.id} variant="small">
          <Text variant="small" style={styles.struck}>
            {r.label}: {resultText(r)}, {r.verdict.toUpperCase()}
          </Text>
          {` — taken ${formatWhen(r.takenAt)}, re-taken (replaced by reading #${r.supersededBy})`}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: Spacing.xs },
  struck: { textDecorationLine: 'line-through' },
});
