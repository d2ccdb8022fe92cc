import { describeError } from '@/lib/api/describe-error';
import { useCreateJobMutation } from '@/lib/hooks/use-jobs';
import { useModelsQuery } from '@/lib/hooks/use-library';
import { formFailure } from '../ui/form-failure';
import { NewJobForm } from './new-job-form';

export type NewJobPanelProps = {
  /** The model the reading's spec belongs to, preselected. */
  modelId: number | null;
  onCancel: () => void;
  onCreated: (jobId: number) => void;
};

/** A new job from inside "Add to job": the compact form, with the library's models and the create request. */
export function NewJobPanel({ modelId, onCancel, onCreated }: NewJobPanelProps) {
  const models = useModelsQuery();
  const create = useCreateJobMutation();
  return (
    <NewJobForm
      compact
      testID="add-to-job-new"
      models={models.data ?? null}
      initialModelId={modelId}
      modelsMessage={models.error ? describeError(models.error) : null}
      pending={create.isPending}
      failure={formFailure(create.error)}
      onCancel={onCancel}
      onSubmit={(b) => create.mutate(b, { onSuccess: (created) => onCreated(created.id) })}
    />
  );
}
