import { StyleSheet, View } from 'react-native';
import type { JobSummaryDto } from '@/lib/contracts/jobs';
import { describeError } from '@/lib/api/describe-error';
import { useStartRunMutation } from '@/lib/hooks/use-plans';
import { Spacing } from '@/lib/theme';
import { machineName } from '../jobs/job-format';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';

export type StartOnJobProps = {
  planId: number;
  jobs: JobSummaryDto[];
  onStarted: (jobId: number, runId: number) => void;
};

/** Starts the plan on one of the technician's open jobs (stands on its own: it owns the start request). */
export function StartOnJob({ planId, jobs, onStarted }: StartOnJobProps) {
  return (
    <Card testID="start-on-job">
      <Text variant="heading">Run it on a job</Text>
      {jobs.length === 0 ? (
        <Text color="textMuted">No open job for this machine. Start one from “My jobs”.</Text>
      ) : null}
      <View style={styles.list}>
        {jobs.map((j) => (
          <StartButton key={j.id} planId={planId} job={j} onStarted={onStarted} />
        ))}
      </View>
    </Card>
  );
}

function StartButton({
  planId,
  job,
  onStarted,
}: {
  planId: number;
  job: JobSummaryDto;
  onStarted: StartOnJobProps['onStarted'];
}) {
  const start = useStartRunMutation(job.id);
  return (
    <View style={styles.list}>
      <Button
        label={`Job #${job.id}: ${machineName(job)}`}
        variant="secondary"
        disabled={start.isPending}
        onPress={() => start.mutate(planId, { onSuccess: (run) => onStarted(job.id, run.id) })}
      />
      {start.error ? (
        <Text variant="small" color="fail" accessibilityRole="alert">
          {describeError(start.error)}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ list: { gap: Spacing.sm } });
