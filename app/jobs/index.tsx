import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { JobList } from '@/components/jobs/job-list';
import { NewJobPanel } from '@/components/jobs/new-job-panel';
import { SignInPrompt } from '@/components/jobs/sign-in-prompt';
import { Button } from '@/components/ui/button';
import { ChoiceRow } from '@/components/ui/choice-row';
import { Screen } from '@/components/ui/screen';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/states';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { describeError } from '@/lib/api/describe-error';
import { useDebouncedValue } from '@/lib/hooks/use-debounced-value';
import { useJobsQuery } from '@/lib/hooks/use-jobs';
import { useReadingQueue } from '@/lib/hooks/use-reading-queue';
import { queuedJobsMatching } from '@/lib/offline/reading-queue';
import { useSession } from '@/lib/session/session-provider';
import { Spacing } from '@/lib/theme';

type StatusFilter = 'all' | 'open' | 'closed';
const FILTERS: { value: StatusFilter; label: string }[] = [
  { value: 'all', label: 'All' },
  { value: 'open', label: 'Open' },
  { value: 'closed', label: 'Closed' },
];

export default function JobsScreen() {
  const router = useRouter();
  const session = useSession();
  const [text, setText] = useState('');
  const [status, setStatus] = useState<StatusFilter>('all');
  const [creating, setCreating] = useState(false);
  const q = useDebouncedValue(text, 250);
  const open = (id: number) => router.push(`/jobs/${id}`);

  if (session.status === 'restoring')
    return (
      <Screen>
        <LoadingState label="Checking your session" />
      </Screen>
    );
  if (session.status !== 'signed-in')
    return (
      <Screen testID="jobs-screen">
        <SignInPrompt />
      </Screen>
    );
  return (
    <Screen testID="jobs-screen">
      <View style={styles.head}>
        <Text variant="title" style={styles.grow}>
          My jobs
        </Text>
        {creating ? null : <Button label="New job" onPress={() => setCreating(true)} testID="new-job" />}
      </View>
      {creating ? <NewJobPanel onCancel={() => setCreating(false)} onCreated={open} /> : null}
      <TextField
        label="Search my jobs"
        placeholder="Machine, VIN, customer, notes"
        value={text}
        onChangeText={setText}
        autoCapitalize="none"
        autoCorrect={false}
        inputMode="search"
        testID="jobs-search"
      />
      <ChoiceRow label="Show" options={FILTERS} value={status} onChange={setStatus} />
      <JobsArea q={q} status={status} onOpen={open} />
    </Screen>
  );
}

function JobsArea({ q, status, onOpen }: { q: string; status: StatusFilter; onOpen: (id: number) => void }) {
  const filter = status === 'all' ? undefined : status;
  const jobs = useJobsQuery({ q, status: filter });
  // Jobs started on this device and not sent yet come first.
  const queued = queuedJobsMatching(useReadingQueue().queuedJobs, q, filter);
  const list = queued.length ? <JobList jobs={[...queued, ...(jobs.data ?? [])]} onOpen={onOpen} /> : null;
  if (jobs.isPending && jobs.fetchStatus === 'paused')
    return (
      <>
        {list}
        <EmptyState message="Offline — this list is not saved on this device yet. It loads when the connection returns." />
      </>
    );
  if (jobs.isPending) return list ?? <LoadingState label="Loading your jobs" />;
  if (jobs.error)
    return (
      <>
        {list}
        <ErrorState message={describeError(jobs.error)} onRetry={jobs.refetch} />
      </>
    );
  if (list) return list;
  if (jobs.data.length === 0) {
    return (
      <EmptyState
        message={
          q.trim() || status !== 'all'
            ? 'No job matches. Clear the search or show all jobs.'
            : 'No jobs yet. Start one with “New job”, or add a reading from any calculator.'
        }
      />
    );
  }
  return <JobList jobs={jobs.data} onOpen={onOpen} />;
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', alignItems: 'center', gap: Spacing.md },
  grow: { flex: 1 },
});
