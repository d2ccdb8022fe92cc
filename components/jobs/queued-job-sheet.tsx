import { StyleSheet, View } from 'react-native';
import type { JobSummaryDto } from '@/lib/contracts/jobs';
import type { QueuedReading, RejectedReading } from '@/lib/offline/reading-queue';
import { Spacing } from '@/lib/theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { MainAndSide } from '../ui/main-and-side';
import { EmptyState } from '../ui/states';
import { Text } from '../ui/text';
import { formatWhen, machineName } from './job-format';
import { QueueNotice } from './queue-notice';
import { ReadingGroups } from './reading-groups';

export type QueuedJobSheetProps = {
  job: JobSummaryDto;
  /** Why the last try to send it failed, if it was tried. */
  lastError: string | null;
  pending: QueuedReading[];
  rejected: RejectedReading[];
  onDismiss: (key: string) => void;
  onCalculator: () => void;
  onModelSheet?: () => void;
};

/**
 * The sheet of a job started on this device with no connection: the machine, the
 * readings added to it so far (all waiting), and the ways to add more. Notes, the
 * report, the CSV and test plans need the server's copy, so they come once it is sent.
 */
export function QueuedJobSheet({
  job,
  lastError,
  pending,
  rejected,
  onDismiss,
  onCalculator,
  onModelSheet,
}: QueuedJobSheetProps) {
  return (
    <>
      <Card testID="job-summary">
        <Text variant="small" color="textMuted">
          New job · started {formatWhen(job.createdAt)} on this device
        </Text>
        <Text variant="title" testID="job-machine">
          {machineName(job)}
        </Text>
        {job.machineId || job.customerRef ? (
          <Text variant="small" color="textMuted">
            {[job.machineId && `VIN / frame ${job.machineId}`, job.customerRef && `Customer ${job.customerRef}`]
              .filter(Boolean)
              .join(' · ')}
          </Text>
        ) : null}
        <Text variant="label" testID="queued-job-status">
          Waiting to be sent — it gets its job number when the connection returns.
        </Text>
        {lastError ? (
          <Text variant="small" color="textMuted">
            Last try: {lastError}
          </Text>
        ) : null}
      </Card>
      <QueueNotice pending={pending} rejected={rejected} onDismiss={onDismiss} />
      <MainAndSide
        main={
          pending.length === 0 ? (
            <EmptyState message="No readings yet. Check a reading on a spec card or in the calculator, then choose “Add to job”." />
          ) : (
            <ReadingGroups readings={[]} pending={pending} />
          )
        }
        side={
          <Card>
            <Text variant="heading">Add readings</Text>
            <Text variant="small" color="textMuted">
              Notes, the report, the CSV and test plans open once the job is sent.
            </Text>
            <View style={styles.actions}>
              <Button
                label="Open the calculator"
                variant="secondary"
                onPress={onCalculator}
                testID="job-open-calculator"
              />
              {onModelSheet ? (
                <Button label="Open the model sheet" variant="quiet" onPress={onModelSheet} testID="job-open-model" />
              ) : null}
            </View>
          </Card>
        }
      />
    </>
  );
}

const styles = StyleSheet.create({
  actions: { gap: Spacing.sm, alignItems: 'flex-start' },
});
