import { Pressable, StyleSheet, View } from 'react-native';
import type { JobSummaryDto } from '@/lib/contracts/jobs';
import { Radius, Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Button } from '../ui/button';
import { ErrorState, LoadingState } from '../ui/states';
import { Text } from '../ui/text';
import { jobRef, jobTag, machineName } from './job-format';

export type JobPickerProps = {
  jobs: JobSummaryDto[] | undefined;
  loading: boolean;
  /** No connection and no kept list: a new job can still be started (it is queued). */
  offline?: boolean;
  error: string | null;
  onRetry: () => void;
  onPick: (job: JobSummaryDto) => void;
  onNewJob: () => void;
  onCancel: () => void;
};

/** Which open job the reading goes on, or a new one. */
export function JobPicker({ jobs, loading, offline, error, onRetry, onPick, onNewJob, onCancel }: JobPickerProps) {
  const t = useTheme();
  return (
    <View style={styles.wrap} testID="job-picker">
      <Text variant="label">Add the reading to which job?</Text>
      {loading ? <LoadingState label="Loading your open jobs" /> : null}
      {offline ? (
        <Text color="textMuted" testID="job-picker-offline">
          Offline — your open jobs are not saved on this device yet.
        </Text>
      ) : null}
      {error ? <ErrorState message={error} onRetry={onRetry} /> : null}
      {jobs && jobs.length === 0 ? (
        <Text color="textMuted">You have no open job. Start one for this machine.</Text>
      ) : null}
      {jobs?.map((job) => (
        <Pressable
          key={job.id}
          accessibilityRole="button"
          accessibilityLabel={`Add to ${jobRef(job.id)}: ${machineName(job)}`}
          onPress={() => onPick(job)}
          testID={`pick-job-${job.id}`}
          style={({ pressed }) => [
            styles.option,
            { borderColor: t.border, backgroundColor: pressed ? t.surfaceMuted : t.surface },
          ]}
        >
          <Text variant="label">
            {jobTag(job.id)} · {machineName(job)}
          </Text>
          {job.machineId || job.customerRef ? (
            <Text variant="small" color="textMuted">
              {[job.machineId, job.customerRef].filter(Boolean).join(' · ')}
            </Text>
          ) : null}
        </Pressable>
      ))}
      <View style={styles.actions}>
        <Button label="New job for this machine" variant="secondary" onPress={onNewJob} testID="pick-new-job" />
        <Button label="Cancel" variant="quiet" onPress={onCancel} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: Spacing.sm },
  option: {
    borderWidth: 1,
    borderRadius: Radius.md,
    padding: Spacing.sm,
    minHeight: 44,
    justifyContent: 'center',
    gap: 2,
  },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: Spacing.sm },
});
