import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Stack, useLocalSearchParams } from 'expo-router';
import { groupByComponent, sentenceCase } from '@/components/jobs/job-format';
import { LiabilityNote } from '@/components/jobs/liability-note';
import { PrintButton } from '@/components/jobs/print-button';
import { ReportHeader } from '@/components/jobs/report-header';
import { ReportReading } from '@/components/jobs/report-reading';
import { jobGate } from '@/components/jobs/job-gate';
import { SupersededList } from '@/components/jobs/superseded-list';
import { ReportPlanSummary } from '@/components/plans/report-plan-summary';
import { Screen } from '@/components/ui/screen';
import { EmptyState } from '@/components/ui/states';
import { Text } from '@/components/ui/text';
import { useJobQuery } from '@/lib/hooks/use-jobs';
import { useRunsQuery } from '@/lib/hooks/use-plans';
import { useSession } from '@/lib/session/session-provider';
import { Spacing } from '@/lib/theme';

export default function JobReportScreen() {
  const { jobId } = useLocalSearchParams<{ jobId: string }>();
  const id = Number(jobId);
  const session = useSession();
  const job = useJobQuery(id, session.status === 'signed-in');
  const runs = useRunsQuery(id, session.status === 'signed-in');
  const [printedAt] = useState(() => new Date().toISOString());

  const gate = jobGate({
    sessionStatus: session.status,
    validId: id > 0,
    query: job,
    loadingLabel: 'Preparing the report',
    testID: 'job-report',
  });
  if (gate || !job.data) return gate;

  const j = job.data;
  const current = j.readings.filter((r) => r.supersededBy === null);
  let n = 0;
  return (
    <Screen testID="job-report">
      <Stack.Screen options={{ title: `Report — job #${id}` }} />
      <View style={styles.page}>
        <PrintButton />
        <ReportHeader job={j} printedAt={printedAt} />
        {(runs.data ?? []).map((run) => (
          <ReportPlanSummary key={run.id} run={run} readings={j.readings} />
        ))}
        <Text variant="heading">Readings</Text>
        {current.length === 0 ? <EmptyState message="No readings on this job yet." /> : null}
        {groupByComponent(current).map((g) => (
          <View key={g.component} style={styles.group}>
            <Text variant="label" color="textMuted">
              {sentenceCase(g.component)}
            </Text>
            {g.readings.map((r) => (
              <ReportReading key={r.id} reading={r} index={++n} />
            ))}
          </View>
        ))}
        <SupersededList readings={j.readings.filter((r) => r.supersededBy !== null)} />
        <LiabilityNote />
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  // About the width of an A4 page's text block, so the screen shows what the paper will.
  page: { width: '100%', maxWidth: 760, alignSelf: 'center', gap: Spacing.md },
  group: { gap: Spacing.sm },
});
