import { StyleSheet, View } from 'react-native';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { FormAlert } from '../ui/form-alert';
import { useServerErrors, type FormFailure } from '../ui/form-failure';
import { FormField } from '../ui/form-field';
import { SubmitButton } from '../ui/submit-button';
import { SignUpBody } from '@/lib/contracts/auth';
import { Spacing } from '@/lib/theme';

export type SignUpFormProps = {
  onSubmit: (values: SignUpBody) => void;
  pending?: boolean;
  failure?: FormFailure | null;
};

export function SignUpForm({ onSubmit, pending = false, failure }: SignUpFormProps) {
  const { control, handleSubmit, setError } = useForm<SignUpBody>({
    defaultValues: { displayName: '', email: '', password: '' },
    resolver: zodResolver(SignUpBody),
  });
  useServerErrors(setError, failure?.fields);
  const submit = handleSubmit((values) => onSubmit(values));
  return (
    <View style={styles.form} testID="sign-up-form">
      <FormField
        control={control}
        name="displayName"
        label="Your name"
        testID="sign-up-name"
        hint="Shown beside your corrections and in the header."
        autoComplete="name"
        autoCapitalize="words"
      />
      <FormField
        control={control}
        name="email"
        label="E-mail address"
        testID="sign-up-email"
        inputMode="email"
        keyboardType="email-address"
        autoComplete="email"
        autoCapitalize="none"
        autoCorrect={false}
      />
      <FormField
        control={control}
        name="password"
        label="Password"
        testID="sign-up-password"
        hint="At least 12 characters; a short phrase is easiest to remember."
        secureTextEntry
        autoComplete="new-password"
        autoCapitalize="none"
        onSubmitEditing={submit}
      />
      {failure ? <FormAlert tone="error" message={failure.message} testID="sign-up-error" /> : null}
      <SubmitButton
        label="Create account"
        pendingLabel="Creating the account…"
        pending={pending}
        onPress={submit}
        testID="sign-up-submit"
      />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: Spacing.md } });
