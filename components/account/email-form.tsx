import { StyleSheet, View } from 'react-native';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { Button } from '../ui/button';
import { FormAlert } from '../ui/form-alert';
import { useServerErrors, type FormFailure } from '../ui/form-failure';
import { FormField } from '../ui/form-field';
import { ForgotBody } from '@/lib/contracts/auth';
import { Spacing } from '@/lib/theme';

export type EmailFormProps = {
  submitLabel: string;
  onSubmit: (email: string) => void;
  pending?: boolean;
  failure?: FormFailure | null;
};

/** One e-mail address, for asking for a password-reset link. */
export function EmailForm({ submitLabel, onSubmit, pending = false, failure }: EmailFormProps) {
  const { control, handleSubmit, setError } = useForm<z.infer<typeof ForgotBody>>({
    defaultValues: { email: '' },
    resolver: zodResolver(ForgotBody),
  });
  useServerErrors(setError, failure?.fields);
  const submit = handleSubmit((values) => onSubmit(values.email));
  return (
    <View style={styles.form} testID="email-form">
      <FormField
        control={control}
        name="email"
        label="E-mail address"
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
