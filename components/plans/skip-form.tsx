import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Spacing } from '@/lib/theme';
import { Button } from '../ui/button';
import { TextField } from '../ui/text-field';

export type SkipFormProps = { pending: boolean; onSkip: (reason: string) => void };

/** Skipping a step needs a reason; it shows on the job's report. */
export function SkipForm({ pending, onSkip }: SkipFormProps) {
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState('');
  if (!open) return <Button label="Skip this step" variant="quiet" onPress={() => setOpen(true)} testID="skip-open" />;
  return (
    <View style={styles.form}>
      <TextField label="Why skip this step?" value={reason} onChangeText={setReason} testID="skip-reason" />
      <Button
        label="Skip with this reason"
        variant="secondary"
        disabled={pending || reason.trim().length === 0}
        onPress={() => onSkip(reason.trim())}
        testID="skip-submit"
      />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: Spacing.sm } });
