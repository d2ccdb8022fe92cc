import { StyleSheet, View } from 'react-native';
import type { JobDetailDto } from '@/lib/contracts/jobs';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Text } from '../ui/text';
import { formatSpan, formatWhen, machineName } from './job-format';
import { VerdictCounts } from './verdict-counts';

export type ReportHeaderProps = { job: JobDetailDto; printedAt: string };

/** The report's head: who, which machine, which customer, when; the shop's notes; the counts. */
export function ReportHeader({ job, printedAt }: ReportHeaderProps) {
  const t = useTheme();
  const times = job.readings.map((r) => r.takenAt).sort();
  const rows: [string, string][] = [
    ['Machine', machineName(job)],
    ['VIN / frame number', job.machineId || '—'],
    ['Customer reference', job.customerRef || '—'],
    ['Job', `#${job.id} · ${job.status === 'open' ? 'open' : 'closed'} · technician ${job.ownerName}`],
    ['Opened', formatWhen(job.createdAt)],
    ['Readings taken', times.length ? formatSpan(times[0], times[times.length - 1]) : 'none'],
    ['Printed', formatWhen(printedAt)],
  ];
  return (
    <View style={[styles.head, { borderBottomColor: t.text }]} testID="report-header">
      <Text variant="title">Specbench job report</Text>
      <View style={styles.table}>
        {rows.map(([k, v]) => (
          <View key={k} style={styles.row}>
            <Text variant="small" color="textMuted" style={styles.key}>
              {k}
            </Text>
            <Text variant="small" style={styles.value}>
              {v}
            </Text>
          </View>
        ))}
      </View>
      {job.notes ? (
        <View style={styles.notes} testID="report-notes">
          <Text variant="label">Notes</Text>
          <Text variant="small">{job.notes}</Text>
        </View>
      ) : null}
      <VerdictCounts counts={job.counts} testID="report-counts" />
    </View>
  );
}

const styles = StyleSheet.create({
  head: { gap: Spacing.sm, borderBottomWidth: 2, paddingBottom: Spacing.md },
  table: { gap: 2 },
  row: { flexDirection: 'row', gap: Spacing.sm },
  key: { width: 140 },
  value: { flex: 1 },
  notes: { gap: 2 },
});
