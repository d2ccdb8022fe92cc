import { StyleSheet, View } from 'react-native';
import { Button } from '../ui/button';
import { TextField } from '../ui/text-field';
import { ResetBody } from '@/lib/contracts/auth';
import { Spacing } from '@/lib/theme';
import { FormAlert } from './form-alert';
import { useFormState, type FormFailure } from './form-state';

export type ResetPasswordFormProps = {
  onSubmit: (password: string) => void;
  pending?: boolean;
  failure?: FormFailure | null;
};

const NewPasswordOnly = ResetBody.pick({ password: true });

/** A new password, typed twice. */
export function ResetPasswordForm({ onSubmit, pending = false, failure }: ResetPasswordFormProps) {
  const form = useFormState({ password: '', confirm: '' });
  const submit = () => {
    const differ = form.values.confirm !== form.values.password ? { confirm: 'The two passwords differ.' } : {};
    const data = form.check(NewPasswordOnly, { password: form.values.password }, differ);
    if (data) onSubmit(data.password);
  };
  return (
    <View style={styles.form} testID="reset-form">
      <TextField
        label="New password"
        {...form.field('password')}
        error={form.errors.password ?? failure?.fields.password}
        hint="At least 12 characters."
        secureTextEntry
        autoComplete="new-password"
        autoCapitalize="none"
        testID="reset-password"
      />
      <TextField
        label="New password again"
        {...form.field('confirm')}
        error={form.errors.confirm}
        secureTextEntry
        autoComplete="new-password"
        autoCapitalize="none"
        onSubmitEditing={submit}
        testID="reset-confirm"
      />
      {failure ? <FormAlert tone="error" message={failure.message} testID="reset-error" /> : null}
      <Button
        label={pending ? 'Saving…' : 'Set the new password'}
        onPress={submit}
        disabled={pending}
        testID="reset-submit"
      />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: Spacing.md } });
