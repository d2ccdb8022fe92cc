import { StyleSheet, View } from 'react-native';
import type { ReadingDto } from '@/lib/contracts/jobs';
import type { RunDto } from '@/lib/contracts/plans';
import { formatQuantity, isCanonicalUnit } from '@/lib/units';
import { Spacing } from '@/lib/theme';
import { VerdictChip } from '../jobs/verdict-chip';
import { Text } from '../ui/text';

export type ReportPlanSummaryProps = { run: RunDto; readings: ReadingDto[] };

const valueOf = (r: ReadingDto | undefined) => {
  if (!r || r.unit === '') return '';
  return isCanonicalUnit(r.unit) ? formatQuantity(r.value, r.unit) : `${r.value} ${r.unit}`;
};

/** A plan run on the customer report: the symptom, the steps done with readings and verdicts, the skipped ones with reasons, the finding. */
export function ReportPlanSummary({ run, readings }: ReportPlanSummaryProps) {
  const done = run.results.filter((r) => r.outcome !== 'skipped');
  const skipped = run.results.filter((r) => r.outcome === 'skipped');
  return (
    <View style={styles.block} testID={`report-run-${run.id}`}>
      <Text variant="heading">Diagnosis: {run.title}</Text>
      <Text>Symptom: {run.symptom}</Text>
      {done.map((r, i) => {
        const reading = readings.find((x) => x.id === r.readingId);
        return (
          <View key={r.id} style={styles.row}>
            <Text style={styles.title}>
              {i + 1}. {r.title} {valueOf(reading)}
            </Text>
            {r.verdict ? <VerdictChip verdict={r.verdict} /> : <Text variant="label">{r.reason}</Text>}
          </View>
        );
      })}
      {skipped.length ? <Text variant="label">Skipped</Text> : null}
      {skipped.map((r) => (
        <Text key={r.id} variant="small">
          {r.title}: {r.skipReason}
        </Text>
      ))}
      <Text variant="label" testID="report-finding">
        {run.finding
          ? `Finding: ${run.finding.part}. ${run.finding.advice}`
          : `Not finished: ${run.results.length} of ${run.stepCount} steps done.`}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  block: { gap: Spacing.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: Spacing.sm, alignItems: 'center' },
  title: { flexGrow: 1, flexBasis: 200 },
});
