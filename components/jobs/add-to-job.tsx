import { StyleSheet, View } from 'react-native';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { useRouter } from 'expo-router';
import { describeError } from '@/lib/api/describe-error';
import { ReadingBody } from '@/lib/contracts/jobs';
import { useAddToJob, type AddToJobTarget } from '@/lib/hooks/use-add-to-job';
import { useSession } from '@/lib/session/session-provider';
import { formatNumber } from '@/lib/units';
import type { ReadingDraft } from '@/lib/offline/reading-body';
import type { Verdict } from '@/lib/verdict';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Button } from '../ui/button';
import { FormField } from '../ui/form-field';
import { Text } from '../ui/text';
import { AddToJobOutcome } from './add-to-job-outcome';
import { formatWhen, jobRef, machineName } from './job-format';
import { JobPicker } from './job-picker';
import { NewJobPanel } from './new-job-panel';

/** `draft`: the reading as it stands (null while incomplete); `verdict`: this device's verdict on it. */
export type AddToJobProps = AddToJobTarget & { draft: ReadingDraft | null; verdict: Verdict | null };

const LabelValues = z.object({ label: ReadingBody.shape.label.unwrap() });
type LabelValues = z.infer<typeof LabelValues>;
const SAY_WHAT = 'Say what you measured, e.g. “stator, yellow to yellow”.';

/**
 * "Add to job" under a calculator's verdict. With a spec (a spec card) the reading goes by
 * spec id; with limits typed by hand it goes with them and a label. The screen passes the
 * job to preselect and the reading being re-taken (links from the job sheet).
 */
export function AddToJob({ draft, verdict, ...target }: AddToJobProps) {
  const router = useRouter();
  const { status } = useSession();
  if (status === 'restoring' || !draft || !verdict) return null;
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
  return <AddToJobPanel draft={draft} verdict={verdict} target={target} />;
}

type PanelProps = { draft: ReadingDraft; verdict: Verdict; target: AddToJobTarget };

function AddToJobPanel({ draft, verdict, target }: PanelProps) {
  const t = useTheme();
  const router = useRouter();
  const job = useAddToJob(target);
  const { control, handleSubmit, setError } = useForm<LabelValues>({
    defaultValues: { label: '' },
    resolver: zodResolver(LabelValues),
  });
  const { jobId, retakeOf, retaken, mode, setMode } = job;
  const done = job.doneFor(draft);
  // Re-taking a hand-typed check: the old label stands unless a new one is typed.
  const send = (to: number) =>
    handleSubmit(({ label }) => {
      const typed = label || retaken?.label || '';
      if (!target.spec && !typed) return setError('label', { type: 'required', message: SAY_WHAT });
      return job.send(to, draft, verdict, typed);
    })();

  return (
    <View testID="add-to-job" style={[styles.wrap, { borderTopColor: t.border }]}>
      <Text variant="heading">Keep this reading</Text>
      {retakeOf !== undefined ? (
        <Text variant="small" testID="add-to-job-retake">
          Re-take of{' '}
          {retaken
            ? `“${retaken.label}” (${formatNumber(retaken.value)} ${retaken.unit}, ${retaken.verdict}, ${formatWhen(retaken.takenAt)})`
            : `reading #${retakeOf}`}{' '}
          on {jobRef(jobId ?? 0)}: the old reading stays on the sheet, struck through.
        </Text>
      ) : null}
      {target.spec ? null : (
        <FormField
          control={control}
          name="label"
          label="What did you measure?"
          placeholder={retaken?.label ?? 'e.g. stator, yellow to yellow'}
          maxLength={200}
          testID="add-to-job-label"
        />
      )}
      {mode === 'picking' ? (
        <JobPicker
          jobs={job.openJobs}
          loading={!job.openJobs && job.jobs.isPending && job.jobs.fetchStatus !== 'paused'}
          offline={!job.openJobs && job.jobs.fetchStatus === 'paused'}
          error={job.jobs.error ? describeError(job.jobs.error) : null}
          onRetry={job.jobs.refetch}
          onPick={(picked) => void send(picked.id)}
          onNewJob={() => setMode('creating')}
          onCancel={() => setMode('idle')}
        />
      ) : null}
      {mode === 'creating' ? (
        <NewJobPanel
          compact
          testID="add-to-job-new"
          modelId={target.spec?.modelId ?? null}
          onCancel={() => setMode('picking')}
          onCreated={(id) => void send(id)}
        />
      ) : null}
      {mode === 'idle' && !done ? (
        <View style={styles.actions}>
          <Button
            label={job.sending ? 'Adding…' : jobId !== null ? `Add to ${jobRef(jobId)}` : 'Add to job'}
            disabled={job.sending}
            onPress={() => (jobId !== null ? void send(jobId) : setMode('picking'))}
            testID="add-to-job-button"
          />
          {jobId !== null ? (
            <Button label="Another job" variant="quiet" onPress={() => setMode('picking')} testID="add-to-job-change" />
          ) : null}
        </View>
      ) : null}
      {job.chosen && mode === 'idle' && !done ? (
        <Text variant="small" color="textMuted">
          Job #{job.chosen.id}: {machineName(job.chosen)}
        </Text>
      ) : null}
      {done ? (
        <AddToJobOutcome
          outcome={done.outcome}
          jobId={done.jobId}
          onOpen={() => router.dismissTo(`/jobs/${done.jobId}`)}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { borderTopWidth: StyleSheet.hairlineWidth, paddingTop: Spacing.md, gap: Spacing.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: Spacing.sm },
});
