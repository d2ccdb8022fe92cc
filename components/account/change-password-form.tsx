import { StyleSheet, View } from 'react-native';
import { Button } from '../ui/button';
import { TextField } from '../ui/text-field';
import { ChangePasswordBody } from '@/lib/contracts/auth';
import { Spacing } from '@/lib/theme';
import { FormAlert } from './form-alert';
import { useFormState, type FormFailure } from './form-state';

export type ChangePasswordFormProps = {
  onSubmit: (values: ChangePasswordBody) => void;
  pending?: boolean;
  failure?: FormFailure | null;
  /** Shown after a change went through. */
  done?: string | null;
};

export function ChangePasswordForm({ onSubmit, pending = false, failure, done }: ChangePasswordFormProps) {
  const form = useFormState({ currentPassword: '', newPassword: '', confirm: '' });
  const error = (k: 'currentPassword' | 'newPassword') => form.errors[k] ?? failure?.fields[k];
  const submit = () => {
    const { currentPassword, newPassword, confirm } = form.values;
    const extra = {
      ...(currentPassword ? {} : { currentPassword: 'Enter your current password.' }),
      ...(confirm !== newPassword ? { confirm: 'The two passwords differ.' } : {}),
    };
    const data = form.check(ChangePasswordBody, { currentPassword, newPassword }, extra);
    if (data) onSubmit(data);
  };
  return (
    <View style={styles.form} testID="change-password-form">
      <TextField
        label="Current password"
        {...form.field('currentPassword')}
        error={error('currentPassword')}
        secureTextEntry
        autoComplete="current-password"
        autoCapitalize="none"
        testID="current-password"
      />
      <TextField
        label="New password"
        {...form.field('newPassword')}
        error={error('newPassword')}
        hint="At least 12 characters. Other devices are signed out."
        secureTextEntry
        autoComplete="new-password"
        autoCapitalize="none"
        testID="new-password"
      />
      <TextField
        label="New password again"
        {...form.field('confirm')}
        error={form.errors.confirm}
        secureTextEntry
        autoComplete="new-password"
        autoCapitalize="none"
        onSubmitEditing={submit}
        testID="confirm-password"
      />
      {failure ? <FormAlert tone="error" message={failure.message} /> : null}
      {done && !failure ? <FormAlert tone="success" message={done} testID="password-changed" /> : null}
      <Button
        label={pending ? 'Changing…' : 'Change password'}
        onPress={submit}
        disabled={pending}
        testID="change-password-submit"
      />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: Spacing.md } });
