import { describeError } from '@/lib/api/describe-error';
import { modelTitle } from '@/lib/format/model-title';
import { useModelsQuery } from '@/lib/hooks/use-library';
import { useCreateJob } from '@/lib/hooks/use-reading-queue';
import { formFailure } from '../ui/form-failure';
import { NewJobForm } from './new-job-form';

export type NewJobPanelProps = {
  /** The model the reading's spec belongs to, preselected. */
  modelId?: number | null;
  /** The short form inside "Add to job" (no notes). */
  compact?: boolean;
  onCancel: () => void;
  /** The new job's id: the server's, or — with no connection — its local id until it is sent. */
  onCreated: (jobId: number) => void;
  testID?: string;
};

/**
 * A new job: the form, with the library's models, sent through the device's queue — so
 * a job can be started with no signal and readings added to it at once.
 */
export function NewJobPanel({ modelId = null, compact, onCancel, onCreated, testID }: NewJobPanelProps) {
  const models = useModelsQuery();
  const create = useCreateJob();
  const titleOf = (id: number | undefined) => {
    const m = id === undefined ? undefined : models.data?.find((x) => x.id === id);
    return m ? modelTitle(m) : null;
  };
  return (
    <NewJobForm
      compact={compact}
      testID={testID}
      models={models.data ?? null}
      initialModelId={modelId}
      modelsMessage={models.error ? `${describeError(models.error)} You can still describe the machine.` : null}
      pending={create.pending}
      failure={formFailure(create.error)}
      onCancel={onCancel}
      onSubmit={(body) =>
        void create.submit(body, titleOf(body.modelId)).then((outcome) => {
          if (outcome?.status === 'sent') onCreated(outcome.job.id);
          if (outcome?.status === 'queued') onCreated(outcome.localId);
        })
      }
    />
  );
}
