import { StyleSheet, View } from 'react-native';
import type { JobDetailDto } from '@/lib/contracts/jobs';
import { Spacing } from '@/lib/theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { formatWhen, machineName } from './job-format';
import { VerdictCounts } from './verdict-counts';

export type JobSummaryProps = {
  job: JobDetailDto;
  onSetStatus: (status: 'open' | 'closed') => void;
  pending?: boolean;
};

/** The top of the job sheet: the machine, its identifier, the customer, the status and the verdict counts. */
export function JobSummary({ job, onSetStatus, pending }: JobSummaryProps) {
  const open = job.status === 'open';
  return (
    <Card testID="job-summary">
      <Text variant="small" color="textMuted">
        Job #{job.id} · opened {formatWhen(job.createdAt)}
      </Text>
      <Text variant="title" testID="job-machine">
        {machineName(job)}
      </Text>
      <View style={styles.facts}>
        <Fact label="VIN / frame number" value={job.machineId || '—'} />
        <Fact label="Customer reference" value={job.customerRef || '—'} />
        <Fact label="Status" value={open ? 'Open' : 'Closed'} testID="job-status" />
      </View>
      <VerdictCounts counts={job.counts} />
      <Button
        label={pending ? 'Saving…' : open ? 'Close the job' : 'Reopen the job'}
        variant="secondary"
        disabled={pending}
        onPress={() => onSetStatus(open ? 'closed' : 'open')}
        style={styles.button}
        testID="job-toggle-status"
      />
      {open ? null : (
        <Text variant="small" color="textMuted">
          A closed job takes no new readings. Reopen it to add one.
        </Text>
      )}
    </Card>
  );
}

function Fact({ label, value, testID }: { label: string; value: string; testID?: string }) {
  return (
    <View style={styles.fact}>
      <Text variant="small" color="textMuted">
        {label}
      </Text>
      <Text variant="label" testID={testID}>
        {value}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  facts: { flexDirection: 'row', flexWrap: 'wrap', gap: Spacing.xl, rowGap: Spacing.sm },
  fact: { gap: 2 },
  button: { alignSelf: 'flex-start' },
});
