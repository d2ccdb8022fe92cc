import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useLocalSearchParams, useRouter } from 'expo-router';
import { describeError } from '@/lib/api/describe-error';
import type { JobSummaryDto } from '@/lib/contracts/jobs';
import { useCreateJobMutation, useJobQuery, useJobsQuery } from '@/lib/hooks/use-jobs';
import { useModelsQuery, useSpecQuery } from '@/lib/hooks/use-library';
import { useReadingQueue } from '@/lib/hooks/use-reading-queue';
import type { AddOutcome } from '@/lib/offline/queue-runner';
import { toReadingBody } from '@/lib/offline/reading-body';
import { useSession } from '@/lib/session/session-provider';
import { formatNumber } from '@/lib/units';
import type { VerdictInput, VerdictResult } from '@/lib/verdict';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { formFailure } from '../ui/form-failure';
import { Button } from '../ui/button';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { formatWhen, machineName } from './job-format';
import { JobPicker } from './job-picker';
import { NewJobForm } from './new-job-form';

export type AddToJobProps = { input: VerdictInput | null; result: VerdictResult | null };

// The job last used on this device in this visit: the next reading most likely belongs to it too.
let lastJob: { userId: number; jobId: number } | null = null;

/**
 * "Add to job" under a calculator's verdict. On a spec card (route param specId) the
 * reading goes by spec id; in the standalone calculator the limits go with it, with a
 * label. ?job= preselects a job and &retake= names the reading this one replaces.
 * Every reading goes through the device's queue, so a dead connection loses nothing.
 */
export function AddToJob({ input, result }: AddToJobProps) {
  const router = useRouter();
  const { status } = useSession();
  if (status === 'restoring' || !input || !result) return null;
  if (status !== 'signed-in') {
    return (
      <Button
        label="Sign in to keep readings on a job"
        variant="secondary"
        onPress={() => router.push('/sign-in')}
        testID="add-to-job-sign-in"
      />
    );
  }
  return <AddToJobPanel input={input} result={result} />;
}

function AddToJobPanel({ input, result }: { input: VerdictInput; result: VerdictResult }) {
  const t = useTheme();
  const router = useRouter();
  const params = useLocalSearchParams<{ specId?: string; job?: string; retake?: string }>();
  const specId = params.specId ? Number(params.specId) : undefined;
  const { user } = useSession();
  const remembered = lastJob && lastJob.userId === user?.id ? lastJob.jobId : null;
  const [jobId, setJobId] = useState<number | null>(params.job ? Number(params.job) : remembered);
  const [retakeOf, setRetakeOf] = useState<number | undefined>(params.retake ? Number(params.retake) : undefined);
  const [mode, setMode] = useState<'idle' | 'picking' | 'creating'>('idle');
  const [label, setLabel] = useState('');
  const [labelError, setLabelError] = useState<string | null>(null);
  const [sent, setSent] = useState<{ for: string; jobId: number; outcome: AddOutcome } | null>(null);
  const [sending, setSending] = useState(false);
  const spec = useSpecQuery(specId ?? 0);
  const jobs = useJobsQuery({ status: 'open' }, mode === 'picking' || jobId !== null);
  const retakeJob = useJobQuery(jobId ?? 0, retakeOf !== undefined);
  const models = useModelsQuery();
  const create = useCreateJobMutation();
  const queue = useReadingQueue();
  const signature = JSON.stringify(input);
  const chosen = jobs.data?.find((j) => j.id === jobId);
  const retaken = retakeJob.data?.readings.find((r) => r.id === retakeOf);
  // Re-taking a hand-typed check: the old label stands unless a new one is typed.
  const typed = label.trim() || retaken?.label || '';
  const what = specId !== undefined ? (spec.data?.parameter ?? 'Reading') : typed;

  const send = async (target: number) => {
    if (specId === undefined && !typed) {
      setLabelError('Say what you measured, e.g. “stator, yellow to yellow”.');
      return;
    }
    setSending(true);
    // eslint-disable-next-line react-hooks/globals -- the module-level memory goes with the useAddToJob() rework
    if (user) lastJob = { userId: user.id, jobId: target };
    setJobId(target);
    setMode('idle');
    const body = toReadingBody(input, specId !== undefined ? { specId } : { label: typed }, { retakeOf });
    const preview = {
      label: what,
      componentName: spec.data?.component.name ?? '',
      value: input.reading.value,
      unit: input.reading.unit,
      verdict: result.verdict,
    };
    const outcome = await queue.add({ jobId: target, body, preview });
    if (outcome.status !== 'rejected') setRetakeOf(undefined);
    setSent({ for: signature, jobId: target, outcome });
    setSending(false);
  };
  const pick = (job: JobSummaryDto) => void send(job.id);
  const done = sent?.for === signature ? sent : null;

  return (
    <View testID="add-to-job" style={[styles.wrap, { borderTopColor: t.border }]}>
      <Text variant="heading">Keep this reading</Text>
      {retakeOf !== undefined ? (
        <Text variant="small" testID="add-to-job-retake">
          Re-take of{' '}
          {retaken
            ? `“${retaken.label}” (${formatNumber(retaken.value)} ${retaken.unit}, ${retaken.verdict}, ${formatWhen(retaken.takenAt)})`
            : `reading #${retakeOf}`}{' '}
          on job #{jobId}: the old reading stays on the sheet, struck through.
        </Text>
      ) : null}
      {specId === undefined ? (
        <TextField
          label="What did you measure?"
          placeholder={retaken?.label ?? 'e.g. stator, yellow to yellow'}
          value={label}
          onChangeText={(v) => {
            setLabel(v);
            setLabelError(null);
          }}
          error={labelError}
          maxLength={200}
          testID="add-to-job-label"
        />
      ) : null}
      {mode === 'picking' ? (
        <JobPicker
          jobs={jobs.data}
          loading={jobs.isPending}
          error={jobs.error ? describeError(jobs.error) : null}
          onRetry={jobs.refetch}
          onPick={pick}
          onNewJob={() => setMode('creating')}
          onCancel={() => setMode('idle')}
        />
      ) : null}
      {mode === 'creating' ? (
        <NewJobForm
          compact
          testID="add-to-job-new"
          models={models.data ?? null}
          initialModelId={spec.data?.model.id ?? null}
          modelsMessage={models.error ? describeError(models.error) : null}
          pending={create.isPending}
          failure={formFailure(create.error)}
          onCancel={() => setMode('picking')}
          onSubmit={(b) => create.mutate(b, { onSuccess: (job) => void send(job.id) })}
        />
      ) : null}
      {mode === 'idle' && !done ? (
        <View style={styles.actions}>
          <Button
            label={sending ? 'Adding…' : jobId !== null ? `Add to job #${jobId}` : 'Add to job'}
            disabled={sending}
            onPress={() => (jobId !== null ? void send(jobId) : setMode('picking'))}
            testID="add-to-job-button"
          />
          {jobId !== null ? (
            <Button label="Another job" variant="quiet" onPress={() => setMode('picking')} testID="add-to-job-change" />
          ) : null}
        </View>
      ) : null}
      {jobId !== null && chosen && mode === 'idle' && !done ? (
        <Text variant="small" color="textMuted">
          Job #{chosen.id}: {machineName(chosen)}
        </Text>
      ) : null}
      {done ? (
        <Outcome outcome={done.outcome} jobId={done.jobId} onOpen={() => router.dismissTo(`/jobs/${done.jobId}`)} />
      ) : null}
    </View>
  );
}

// dismissTo: back to the job sheet when the technician came from it (a re-take), else opens it.
function Outcome({ outcome, jobId, onOpen }: { outcome: AddOutcome; jobId: number; onOpen: () => void }) {
  const message =
    outcome.status === 'sent'
      ? `Added to job #${jobId}`
      : outcome.status === 'queued'
        ? 'Queued — will send when online'
        : `Not added: ${outcome.message}`;
  return (
    <View style={styles.outcome} accessibilityRole="alert" accessibilityLiveRegion="polite">
      <Text
        variant="label"
        color={outcome.status === 'sent' ? 'pass' : outcome.status === 'queued' ? 'text' : 'fail'}
        testID="add-to-job-outcome"
      >
        {message}
      </Text>
      <Button
        label={`Open job sheet #${jobId}`}
        variant="quiet"
        onPress={onOpen}
        style={styles.link}
        testID="add-to-job-open"
      />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { borderTopWidth: StyleSheet.hairlineWidth, paddingTop: Spacing.md, gap: Spacing.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: Spacing.sm },
  outcome: { gap: Spacing.xs },
  link: { alignSelf: 'flex-start', paddingHorizontal: 0 },
});
