import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { JobActions } from '@/components/jobs/job-actions';
import { JobNotes } from '@/components/jobs/job-notes';
import { JobSummary } from '@/components/jobs/job-summary';
import { QueueNotice } from '@/components/jobs/queue-notice';
import { ReadingGroups } from '@/components/jobs/reading-groups';
import { jobGate } from '@/components/jobs/job-gate';
import { JobDiagnosis } from '@/components/plans/job-diagnosis';
import { MainAndSide } from '@/components/ui/main-and-side';
import { Screen } from '@/components/ui/screen';
import { EmptyState } from '@/components/ui/states';
import { describeError } from '@/lib/api/describe-error';
import type { ReadingDto } from '@/lib/contracts/jobs';
import { useDownloadCsvMutation, useJobQuery, useUpdateJobMutation } from '@/lib/hooks/use-jobs';
import { useRunsQuery } from '@/lib/hooks/use-plans';
import { useReadingQueue } from '@/lib/hooks/use-reading-queue';
import { useSession } from '@/lib/session/session-provider';

export default function JobSheetScreen() {
  const { jobId } = useLocalSearchParams<{ jobId: string }>();
  const id = Number(jobId);
  const router = useRouter();
  const session = useSession();
  const job = useJobQuery(id, session.status === 'signed-in');
  const update = useUpdateJobMutation();
  const notes = useUpdateJobMutation();
  const csv = useDownloadCsvMutation();
  const queue = useReadingQueue();
  const runs = useRunsQuery(id, session.status === 'signed-in');

  const gate = jobGate({
    sessionStatus: session.status,
    validId: id > 0,
    query: job,
    loadingLabel: 'Loading the job sheet',
    testID: 'job-sheet',
  });
  if (gate || !job.data) return gate;

  const j = job.data;
  const pending = queue.pendingFor(id);
  const open = j.status === 'open';
  const retake = (r: ReadingDto) =>
    router.push(
      r.specId !== null ? `/specs/${r.specId}?job=${id}&retake=${r.id}` : `/calculator?job=${id}&retake=${r.id}`,
    );
  const side = (
    <>
      <JobDiagnosis
        open={open}
        runs={runs.data ?? []}
        onDiagnose={() => router.push(`/jobs/${id}/plans`)}
        onOpenRun={(r) => router.push(`/jobs/${id}/runs/${r.id}`)}
      />
      <JobNotes
        notes={j.notes}
        pending={notes.isPending}
        error={notes.error ? describeError(notes.error) : null}
        onSave={(text) => notes.mutate({ id, notes: text })}
      />
      <JobActions
        open={open}
        onReport={() => router.push(`/jobs/${id}/report`)}
        onCsv={() => csv.mutate(id)}
        csvPending={csv.isPending}
        csvError={csv.error ? describeError(csv.error) : null}
        onModelSheet={j.modelId !== null ? () => router.push(`/models/${j.modelId}`) : undefined}
        onCalculator={() => router.push(`/calculator?job=${id}`)}
      />
    </>
  );
  return (
    <Screen testID="job-sheet">
      <Stack.Screen options={{ title: `Job #${id}` }} />
      <JobSummary job={j} pending={update.isPending} onSetStatus={(status) => update.mutate({ id, status })} />
      <QueueNotice pending={pending} rejected={queue.rejectedFor(id)} onDismiss={queue.dismiss} />
      <MainAndSide
        main={
          j.readings.length + pending.length === 0 ? (
            <EmptyState message="No readings yet. Check a reading on a spec card or in the calculator, then choose “Add to job”." />
          ) : (
            <ReadingGroups readings={j.readings} pending={pending} onRetake={open ? retake : undefined} />
          )
        }
        side={side}
      />
    </Screen>
  );
}
