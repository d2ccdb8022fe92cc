import { StyleSheet, View } from 'react-native';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { FormAlert } from '../ui/form-alert';
import { useServerErrors, type FormFailure } from '../ui/form-failure';
import { FormField } from '../ui/form-field';
import { SubmitButton } from '../ui/submit-button';
import { ChangePasswordBody } from '@/lib/contracts/auth';
import { Spacing } from '@/lib/theme';

export type ChangePasswordFormProps = {
  onSubmit: (values: ChangePasswordBody) => void;
  pending?: boolean;
  failure?: FormFailure | null;
  /** Shown after a change went through. */
  done?: string | null;
};

/** The form's own check: the request's rules, in the form's words, and the new password typed twice. */
const ChangePasswordValues = ChangePasswordBody.extend({
  currentPassword: z.string().min(1, 'Enter your current password.').max(200),
  confirm: z.string(),
}).refine((v) => v.confirm === v.newPassword, { path: ['confirm'], message: 'The two passwords differ.' });
type ChangePasswordValues = z.infer<typeof ChangePasswordValues>;

export function ChangePasswordForm({ onSubmit, pending = false, failure, done }: ChangePasswordFormProps) {
  const { control, handleSubmit, setError } = useForm<ChangePasswordValues>({
    defaultValues: { currentPassword: '', newPassword: '', confirm: '' },
    resolver: zodResolver(ChangePasswordValues),
  });
  useServerErrors(setError, failure?.fields);
  const submit = handleSubmit(({ currentPassword, newPassword }) => onSubmit({ currentPassword, newPassword }));
  return (
    <View style={styles.form} testID="change-password-form">
      <FormField
        control={control}
        name="currentPassword"
        label="Current password"
        secureTextEntry
        autoComplete="current-password"
        autoCapitalize="none"
        testID="current-password"
      />
      <FormField
        control={control}
        name="newPassword"
        label="New password"
        hint="At least 12 characters. Other devices are signed out."
        secureTextEntry
        autoComplete="new-password"
        autoCapitalize="none"
        testID="new-password"
      />
      <FormField
        control={control}
        name="confirm"
        label="New password again"
        secureTextEntry
        autoComplete="new-password"
        autoCapitalize="none"
        onSubmitEditing={submit}
        testID="confirm-password"
      />
      {failure ? <FormAlert tone="error" message={failure.message} /> : null}
      {done && !failure ? <FormAlert tone="success" message={done} testID="password-changed" /> : null}
      <SubmitButton
        label="Change password"
        pendingLabel="Changing…"
        pending={pending}
        onPress={submit}
        testID="change-password-submit"
      />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: Spacing.md } });
