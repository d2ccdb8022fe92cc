import { Pressable, StyleSheet, View } from 'react-native';
import type { JobSummaryDto } from '@/lib/contracts/jobs';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { countsText, formatWhen, jobRef, jobTag, machineName } from './job-format';

export type JobListProps = { jobs: JobSummaryDto[]; onOpen: (id: number) => void };

/** My jobs, newest first: machine, identifier, customer, status and verdict counts per row. */
export function JobList({ jobs, onOpen }: JobListProps) {
  const t = useTheme();
  return (
    <Card testID="job-list" style={styles.card}>
      {jobs.map((job, i) => (
        <Pressable
          key={job.id}
          testID={`job-${job.id}`}
          accessibilityRole="link"
          accessibilityLabel={`Open ${jobRef(job.id)}: ${machineName(job)}`}
          onPress={() => onOpen(job.id)}
          style={({ pressed }) => [
            styles.row,
            i > 0 && { borderTopWidth: StyleSheet.hairlineWidth, borderTopColor: t.border },
            { backgroundColor: pressed ? t.surfaceMuted : 'transparent' },
          ]}
        >
          <View style={styles.top}>
            <Text variant="label" style={styles.grow}>
              {jobTag(job.id)} · {machineName(job)}
            </Text>
            <Text variant="small" color={job.status === 'open' ? 'primary' : 'textMuted'}>
              {job.status === 'open' ? 'Open' : 'Closed'}
            </Text>
          </View>
          <Text variant="small" color="textMuted">
            {[
              job.machineId && `ID ${job.machineId}`,
              job.customerRef && `Customer ${job.customerRef}`,
              `Opened ${formatWhen(job.createdAt)}`,
            ]
              .filter(Boolean)
              .join(' · ')}
          </Text>
          <Text variant="small">{countsText(job.counts)}</Text>
        </Pressable>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { padding: 0, gap: 0 },
  row: { paddingHorizontal: Spacing.lg, paddingVertical: Spacing.md, gap: 2, minHeight: 44 },
  top: { flexDirection: 'row', gap: Spacing.sm, alignItems: 'baseline' },
  grow: { flex: 1 },
});
