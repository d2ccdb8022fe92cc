import { StyleSheet, View } from 'react-native';
import type { ReadingDto } from '@/lib/contracts/jobs';
import type { QueuedReading } from '@/lib/offline/reading-queue';
import { Spacing } from '@/lib/theme';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { groupByComponent, sentenceCase } from './job-format';
import { PendingReadingRow } from './pending-reading-row';
import { ReadingCard } from './reading-card';

export type ReadingGroupsProps = {
  readings: ReadingDto[];
  pending: QueuedReading[];
  /** Absent when the job is closed. */
  onRetake?: (reading: ReadingDto) => void;
};

type Row = { componentName: string; reading?: ReadingDto; pending?: QueuedReading };

/** The job's readings by component (hand-typed checks under "Other checks"), waiting ones among them. */
export function ReadingGroups({ readings, pending, onRetake }: ReadingGroupsProps) {
  // A reading whose re-take is still waiting on the device cannot be re-taken again.
  const retakeWaiting = new Set(pending.map((p) => p.body.retakeOf));
  const rows: Row[] = [
    ...readings.map((r) => ({ componentName: r.componentName, reading: r })),
    ...pending.map((p) => ({ componentName: p.preview.componentName, pending: p })),
  ];
  return (
    <View style={styles.list} testID="reading-groups">
      {groupByComponent(rows).map((g) => (
        <Card key={g.component} testID="reading-group">
          <Text variant="heading">{sentenceCase(g.component)}</Text>
          {g.readings.map((row) =>
            row.reading ? (
              <ReadingCard
                key={row.reading.id}
                reading={row.reading}
                onRetake={onRetake && !retakeWaiting.has(row.reading.id) ? () => onRetake(row.reading!) : undefined}
              />
            ) : (
              <PendingReadingRow key={row.pending!.key} item={row.pending!} />
            ),
          )}
        </Card>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: Spacing.md },
});
