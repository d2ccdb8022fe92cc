import { StyleSheet, View } from 'react-native';
import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { UpdateJobBody } from '@/lib/contracts/jobs';
import { Spacing } from '@/lib/theme';
import { Card } from '../ui/card';
import { FormField } from '../ui/form-field';
import { SubmitButton } from '../ui/submit-button';
import { Text } from '../ui/text';

export type JobNotesProps = {
  notes: string | null;
  onSave: (notes: string) => void;
  pending?: boolean;
  error?: string | null;
};

const NotesValues = z.object({ notes: UpdateJobBody.shape.notes.unwrap() });
type NotesValues = z.infer<typeof NotesValues>;

/** The shop's notes on the job (they go on the printed report). */
export function JobNotes({ notes, onSave, pending, error }: JobNotesProps) {
  const { control, handleSubmit } = useForm<NotesValues>({
    // A save (or another device) changed the notes: the form shows what the server holds.
    values: { notes: notes ?? '' },
    resolver: zodResolver(NotesValues),
  });
  const text = useWatch({ control, name: 'notes' }) ?? '';
  const changed = text.trim() !== (notes ?? '').trim();
  return (
    <Card testID="job-notes">
      <Text variant="heading">Notes</Text>
      <FormField
        control={control}
        name="notes"
        label="Notes for the job and the report"
        hideLabel
        placeholder="Symptoms, what was checked, what was replaced…"
        multiline
        numberOfLines={4}
        style={styles.input}
        error={error}
        testID="job-notes-field"
      />
      <View style={styles.actions}>
        <SubmitButton
          label={changed ? 'Save notes' : 'Notes saved'}
          pendingLabel="Saving…"
          pending={pending}
          onPress={handleSubmit((v) => onSave(v.notes))}
          disabled={!changed}
          variant="secondary"
          testID="job-notes-save"
        />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  input: { minHeight: 110, paddingTop: Spacing.sm, textAlignVertical: 'top' },
  actions: { flexDirection: 'row' },
});
