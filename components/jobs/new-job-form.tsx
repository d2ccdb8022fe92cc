import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { CreateJobBody } from '@/lib/contracts/jobs';
import type { ModelSummaryDto } from '@/lib/contracts/library';
import { Spacing } from '@/lib/theme';
import { FormAlert } from '../account/form-alert';
import { useFormState, type FormFailure } from '../account/form-state';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ChoiceRow } from '../ui/choice-row';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
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

const blank = (s: string) => (s.trim() === '' ? undefined : s.trim());

/** A new job: a model from the library or a machine described in words, its VIN / frame number, the customer. */
export function NewJobForm({
  models,
  modelsMessage,
  initialModelId = null,
  onSubmit,
  onCancel,
  pending,
  failure,
  compact,
  testID = 'new-job-form',
}: NewJobFormProps) {
  const form = useFormState({ machineLabel: '', machineId: '', customerRef: '', notes: '' });
  const [inLibrary, setInLibrary] = useState(true);
  const [modelId, setModelId] = useState<number | null>(initialModelId);
  const error = (k: string) => form.errors[k] ?? failure?.fields[k];
  const submit = () => {
    const v = form.values;
    const body = {
      modelId: inLibrary ? (modelId ?? undefined) : undefined,
      machineLabel: blank(v.machineLabel),
      machineId: blank(v.machineId),
      customerRef: blank(v.customerRef),
      notes: compact ? undefined : blank(v.notes),
    };
    const extra = inLibrary && modelId === null ? { modelId: 'Pick the model, or choose “Not in the library”.' } : {};
    const data = form.check(CreateJobBody, body, extra);
    if (data) onSubmit(data);
  };
  return (
    <Card testID={testID}>
      <Text variant="heading">New job</Text>
      <ChoiceRow
        label="The machine"
        value={inLibrary}
        options={[
          { value: true, label: 'A model in the library' },
          { value: false, label: 'Not in the library' },
        ]}
        onChange={setInLibrary}
      />
      {inLibrary ? (
        models ? (
          <ModelPicker models={models} value={modelId} onChange={setModelId} error={error('modelId')} />
        ) : (
          <Text color="textMuted">{modelsMessage ?? 'Loading the library’s models…'}</Text>
        )
      ) : null}
      <TextField
        label={inLibrary ? 'Machine description (optional)' : 'Machine description'}
        placeholder="e.g. customer quad, 250 cc, blue"
        {...form.field('machineLabel')}
        error={error('machineLabel')}
        testID="job-machine-label"
      />
      <View style={styles.pair}>
        <View style={styles.cell}>
          <TextField
            label="VIN or frame number"
            {...form.field('machineId')}
            error={error('machineId')}
            autoCapitalize="characters"
            autoCorrect={false}
            testID="job-machine-id"
          />
        </View>
        <View style={styles.cell}>
          <TextField
            label="Customer reference"
            {...form.field('customerRef')}
            error={error('customerRef')}
            testID="job-customer-ref"
          />
        </View>
      </View>
      {compact ? null : (
        <TextField
          label="Notes"
          {...form.field('notes')}
          error={error('notes')}
          multiline
          numberOfLines={3}
          style={styles.notes}
          testID="job-notes-input"
        />
      )}
      {failure ? <FormAlert tone="error" message={failure.message} /> : null}
      <View style={styles.actions}>
        <Button
          label={pending ? 'Creating…' : 'Create the job'}
          onPress={submit}
          disabled={pending}
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
