import { useEffect } from 'react';
import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { JobActions } from '@/components/jobs/job-actions';
import { JobNotes } from '@/components/jobs/job-notes';
import { JobSummary } from '@/components/jobs/job-summary';
import { QueueNotice } from '@/components/jobs/queue-notice';
import { QueuedJobSheet } from '@/components/jobs/queued-job-sheet';
import { ReadingGroups } from '@/components/jobs/reading-groups';
import { jobGate } from '@/components/jobs/job-gate';
import { JobDiagnosis } from '@/components/plans/job-diagnosis';
import { MainAndSide } from '@/components/ui/main-and-side';
import { Screen } from '@/components/ui/screen';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/states';
import { describeError } from '@/lib/api/describe-error';
import type { ReadingDto } from '@/lib/contracts/jobs';
import { useDownloadCsvMutation, useJobQuery, useUpdateJobMutation } from '@/lib/hooks/use-jobs';
import { useRunsQuery } from '@/lib/hooks/use-plans';
import { useReadingQueue } from '@/lib/hooks/use-reading-queue';
import { isLocalJobId, queuedJobSummary } from '@/lib/offline/reading-queue';
import { useSession } from '@/lib/session/session-provider';

export default function JobSheetScreen() {
  const { jobId } = useLocalSearchParams<{ jobId: string }>();
  const id = Number(jobId);
  return isLocalJobId(id) ? <QueuedJobScreen localId={id} /> : <ServerJobScreen id={id} />;
}

/**
 * A job started on this device and not sent yet (its address has the local id). Once
 * the server has stored it, the address moves to the job's number.
 */
function QueuedJobScreen({ localId }: { localId: number }) {
  const router = useRouter();
  const session = useSession();
  const queue = useReadingQueue();
  const sent = queue.sentJobId(localId);
  useEffect(() => {
    if (sent !== null) router.replace(`/jobs/${sent}`);
  }, [sent, router]);
  const queued = queue.queuedJob(localId);
  const refused = queue.rejectedJob(localId);
  const body =
    session.status === 'restoring' || sent !== null ? (
      <LoadingState label={sent !== null ? 'Opening the job sheet' : 'Checking your session'} />
    ) : queued ? (
      <QueuedJobSheet
        job={queuedJobSummary(queued, session.user?.displayName ?? '')}
        lastError={queued.lastError}
        pending={queue.pendingFor(localId)}
        rejected={queue.rejectedFor(localId)}
        onDismiss={queue.dismiss}
        onCalculator={() => router.push(`/calculator?job=${localId}`)}
        onModelSheet={queued.body.modelId ? () => router.push(`/models/${queued.body.modelId}`) : undefined}
      />
    ) : refused ? (
      <>
        <ErrorState message={`This job was not saved: ${refused.message}`} />
        <QueueNotice pending={[]} rejected={queue.rejectedFor(localId)} onDismiss={queue.dismiss} />
      </>
    ) : (
      <EmptyState message="This job is not on this device. It may have been started on another device or by another account." />
    );
  return (
    <Screen testID="job-sheet">
      <Stack.Screen options={{ title: 'New job' }} />
      {body}
    </Screen>
  );
}

function ServerJobScreen({ id }: { id: number }) {
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
