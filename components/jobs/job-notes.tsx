import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Spacing } from '@/lib/theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';

export type JobNotesProps = {
  notes: string | null;
  onSave: (notes: string) => void;
  pending?: boolean;
  error?: string | null;
};

/** The shop's notes on the job (they go on the printed report). */
export function JobNotes({ notes, onSave, pending, error }: JobNotesProps) {
  const [text, setText] = useState(notes ?? '');
  const [shown, setShown] = useState(notes);
  // A save (or another device) changed the notes: show what the server holds.
  if (notes !== shown) {
    setShown(notes);
    setText(notes ?? '');
  }
  const changed = text.trim() !== (notes ?? '').trim();
  return (
    <Card testID="job-notes">
      <Text variant="heading">Notes</Text>
      <TextField
        label="Notes for the job and the report"
        hideLabel
        placeholder="Symptoms, what was checked, what was replaced…"
        value={text}
        onChangeText={setText}
        multiline
        numberOfLines={4}
        style={styles.input}
        error={error}
        testID="job-notes-field"
      />
      <View style={styles.actions}>
        <Button
          label={pending ? 'Saving…' : changed ? 'Save notes' : 'Notes saved'}
          onPress={() => onSave(text.trim())}
          disabled={!changed || pending}
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
