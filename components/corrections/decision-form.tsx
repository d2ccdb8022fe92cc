import { StyleSheet, View } from 'react-native';
import { useController, useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { AcceptBody, RejectBody } from '@/lib/contracts/corrections';
import { Spacing } from '@/lib/theme';
import { Button } from '../ui/button';
import { ChoiceRow } from '../ui/choice-row';
import { FormField } from '../ui/form-field';

export type DecisionFormProps = {
  /** The spec changed after the proposal: accepting needs the editor's word that they compared. */
  stale: boolean;
  pending: boolean;
  onAccept: (body: z.infer<typeof AcceptBody>) => void;
  onReject: (body: z.infer<typeof RejectBody>) => void;
};

const DecisionValues = z.object({ note: AcceptBody.shape.note.unwrap(), confirmed: z.boolean() });
type DecisionValues = z.infer<typeof DecisionValues>;

/** An editor's decision on one proposal: a note (required to reject), then accept or reject. */
export function DecisionForm({ stale, pending, onAccept, onReject }: DecisionFormProps) {
  const { control, handleSubmit } = useForm<DecisionValues>({
    defaultValues: { note: '', confirmed: false },
    resolver: zodResolver(DecisionValues),
  });
  const confirmed = useController({ control, name: 'confirmed' }).field;
  const note = useWatch({ control, name: 'note' }) ?? '';
  return (
    <View style={styles.decide}>
      <FormField
        control={control}
        name="note"
        label="Note to the proposer (required to reject)"
        multiline
        testID="decision-note"
      />
      {stale ? (
        <ChoiceRow
          label="I have compared the current values"
          options={[{ value: true, label: 'Yes, apply anyway' }]}
          value={confirmed.value || null}
          onChange={() => confirmed.onChange(true)}
        />
      ) : null}
      <View style={styles.buttons}>
        <Button
          label="Accept"
          disabled={pending || (stale && !confirmed.value)}
          testID="accept-button"
          onPress={handleSubmit((v) => onAccept({ confirmStale: stale, note: v.note }))}
        />
        <Button
          label="Reject"
          variant="secondary"
          disabled={pending || note.trim().length < 3}
          testID="reject-button"
          onPress={handleSubmit((v) => onReject({ note: v.note }))}
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  decide: { gap: Spacing.md, maxWidth: 640 },
  buttons: { flexDirection: 'row', gap: Spacing.sm },
});
