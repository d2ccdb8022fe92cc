import { StyleSheet, View } from 'react-native';
import { useController, useForm } from 'react-hook-form';
import { CreateJobBody } from '@/lib/contracts/jobs';
import type { ModelSummaryDto } from '@/lib/contracts/library';
import { Spacing } from '@/lib/theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ChoiceRow } from '../ui/choice-row';
import { FormAlert } from '../ui/form-alert';
import { useServerErrors, type FormFailure } from '../ui/form-failure';
import { FormField } from '../ui/form-field';
import { bodyResolver } from '../ui/form-resolver';
import { SubmitButton } from '../ui/submit-button';
import { Text } from '../ui/text';
import { ModelPicker } from './model-picker';

export type NewJobFormProps = {
  /** The library's models, or null while they load or when they failed (see modelsMessage). */
  models: ModelSummaryDto[] | null;
  modelsMessage?: string | null;
  initialModelId?: number | null;
  onSubmit: (body: CreateJobBody) => void;
  onCancel?: () => void;
  pending?: boolean;
  failure?: FormFailure | null;
  /** Without the notes field (creating a job from the calculator). */
  compact?: boolean;
  testID?: string;
};

type NewJobValues = {
  inLibrary: boolean;
  modelId: number | null;
  machineLabel: string;
  machineId: string;
  customerRef: string;
  notes: string;
};

const blank = (s: string) => (s.trim() === '' ? undefined : s.trim());

/** The request body for what the form holds: only the model or the words, whichever was chosen. */
const toBody = (compact: boolean) => (v: NewJobValues) => ({
  modelId: v.inLibrary ? (v.modelId ?? undefined) : undefined,
  machineLabel: blank(v.machineLabel),
  machineId: blank(v.machineId),
  customerRef: blank(v.customerRef),
  notes: compact ? undefined : blank(v.notes),
});
const pickTheModel = (v: NewJobValues) =>
  v.inLibrary && v.modelId === null ? { modelId: 'Pick the model, or choose “Not in the library”.' } : {};

/** A new job: a model from the library or a machine described in words, its VIN / frame number, the customer. */
export function NewJobForm({
  models,
  modelsMessage,
  initialModelId = null,
  onSubmit,
  onCancel,
  pending,
  failure,
  compact = false,
  testID = 'new-job-form',
}: NewJobFormProps) {
  const { control, handleSubmit, setError } = useForm<NewJobValues, unknown, CreateJobBody>({
    defaultValues: {
      inLibrary: true,
      modelId: initialModelId,
      machineLabel: '',
      machineId: '',
      customerRef: '',
      notes: '',
    },
    resolver: bodyResolver(CreateJobBody, toBody(compact), { extra: pickTheModel }),
  });
  useServerErrors(setError, failure?.fields);
  const inLibrary = useController({ control, name: 'inLibrary' }).field;
  const model = useController({ control, name: 'modelId' });
  return (
    <Card testID={testID}>
      <Text variant="heading">New job</Text>
      <ChoiceRow
        label="The machine"
        value={inLibrary.value}
        options={[
          { value: true, label: 'A model in the library' },
          { value: false, label: 'Not in the library' },
        ]}
        onChange={inLibrary.onChange}
      />
      {inLibrary.value ? (
        models ? (
          <ModelPicker
            models={models}
            value={model.field.value}
            onChange={model.field.onChange}
            error={model.fieldState.error?.message}
          />
        ) : (
          <Text color="textMuted">{modelsMessage ?? 'Loading the library’s models…'}</Text>
        )
      ) : null}
      <FormField
        control={control}
        name="machineLabel"
        label={inLibrary.value ? 'Machine description (optional)' : 'Machine description'}
        placeholder="e.g. customer quad, 250 cc, blue"
        testID="job-machine-label"
      />
      <View style={styles.pair}>
        <View style={styles.cell}>
          <FormField
            control={control}
            name="machineId"
            label="VIN or frame number"
            autoCapitalize="characters"
            autoCorrect={false}
            testID="job-machine-id"
          />
        </View>
        <View style={styles.cell}>
          <FormField control={control} name="customerRef" label="Customer reference" testID="job-customer-ref" />
        </View>
      </View>
      {compact ? null : (
        <FormField
          control={control}
          name="notes"
          label="Notes"
          multiline
          numberOfLines={3}
          style={styles.notes}
          testID="job-notes-input"
        />
      )}
      {failure ? <FormAlert tone="error" message={failure.message} /> : null}
      <View style={styles.actions}>
        <SubmitButton
          label="Create the job"
          pendingLabel="Creating…"
          pending={pending}
          onPress={handleSubmit((body) => onSubmit(body))}
          testID="create-job"
        />
        {onCancel ? <Button label="Cancel" variant="quiet" onPress={onCancel} /> : null}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  pair: { flexDirection: 'row', flexWrap: 'wrap', gap: Spacing.sm },
  cell: { flex: 1, minWidth: 200 },
  notes: { minHeight: 88, paddingTop: Spacing.sm, textAlignVertical: 'top' },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: Spacing.sm },
});
