import { StyleSheet, View } from 'react-native';
import { Button } from '../ui/button';
import { TextField } from '../ui/text-field';
import { ForgotBody } from '@/lib/contracts/auth';
import { Spacing } from '@/lib/theme';
import { FormAlert } from './form-alert';
import { useFormState, type FormFailure } from './form-state';

export type EmailFormProps = {
  submitLabel: string;
  onSubmit: (email: string) => void;
  pending?: boolean;
  failure?: FormFailure | null;
};

/** One e-mail address, for asking for a password-reset link. */
export function EmailForm({ submitLabel, onSubmit, pending = false, failure }: EmailFormProps) {
  const form = useFormState({ email: '' });
  const submit = () => {
    const data = form.check(ForgotBody, form.values);
    if (data) onSubmit(data.email);
  };
  return (
    <View style={styles.form} testID="email-form">
      <TextField
        label="E-mail address"
        {...form.field('email')}
        error={form.errors.email ?? failure?.fields.email}
        testID="email-input"
        inputMode="email"
        keyboardType="email-address"
        autoComplete="email"
        autoCapitalize="none"
        autoCorrect={false}
        onSubmitEditing={submit}
      />
      {failure ? <FormAlert tone="error" message={failure.message} /> : null}
      <Button label={submitLabel} onPress={submit} disabled={pending} testID="email-submit" />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: Spacing.md } });
