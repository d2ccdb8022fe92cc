import { StyleSheet, View } from 'react-native';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { FormAlert } from '../ui/form-alert';
import { useServerErrors, type FormFailure } from '../ui/form-failure';
import { FormField } from '../ui/form-field';
import { SubmitButton } from '../ui/submit-button';
import { ResetBody } from '@/lib/contracts/auth';
import { Spacing } from '@/lib/theme';

export type ResetPasswordFormProps = {
  onSubmit: (password: string) => void;
  pending?: boolean;
  failure?: FormFailure | null;
};

/** The form's own check: the request's password rule, and the same password typed twice. */
const NewPasswordTwice = ResetBody.pick({ password: true })
  .extend({ confirm: z.string() })
  .refine((v) => v.confirm === v.password, { path: ['confirm'], message: 'The two passwords differ.' });
type NewPasswordTwice = z.infer<typeof NewPasswordTwice>;

/** A new password, typed twice. */
export function ResetPasswordForm({ onSubmit, pending = false, failure }: ResetPasswordFormProps) {
  const { control, handleSubmit, setError } = useForm<NewPasswordTwice>({
    defaultValues: { password: '', confirm: '' },
    resolver: zodResolver(NewPasswordTwice),
  });
  useServerErrors(setError, failure?.fields);
  const submit = handleSubmit((values) => onSubmit(values.password));
  return (
    <View style={styles.form} testID="reset-form">
      <FormField
        control={control}
        name="password"
        label="New password"
        hint="At least 12 characters."
        secureTextEntry
        autoComplete="new-password"
        autoCapitalize="none"
        testID="reset-password"
      />
      <FormField
        control={control}
        name="confirm"
        label="New password again"
        secureTextEntry
        autoComplete="new-password"
        autoCapitalize="none"
        onSubmitEditing={submit}
        testID="reset-confirm"
      />
      {failure ? <FormAlert tone="error" message={failure.message} testID="reset-error" /> : null}
      <SubmitButton
        label="Set the new password"
        pendingLabel="Saving…"
        pending={pending}
        onPress={submit}
        testID="reset-submit"
      />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: Spacing.md } });
