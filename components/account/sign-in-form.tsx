import { StyleSheet, View } from 'react-native';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { FormAlert } from '../ui/form-alert';
import { useServerErrors, type FormFailure } from '../ui/form-failure';
import { FormField } from '../ui/form-field';
import { SubmitButton } from '../ui/submit-button';
import { SignInBody } from '@/lib/contracts/auth';
import { Spacing } from '@/lib/theme';

export type SignInFormProps = {
  onSubmit: (values: SignInBody) => void;
  pending?: boolean;
  failure?: FormFailure | null;
};

export function SignInForm({ onSubmit, pending = false, failure }: SignInFormProps) {
  const { control, handleSubmit, setError } = useForm<SignInBody>({
    defaultValues: { email: '', password: '' },
    resolver: zodResolver(SignInBody),
  });
  useServerErrors(setError, failure?.fields);
  const submit = handleSubmit((values) => onSubmit(values));
  return (
    <View style={styles.form} testID="sign-in-form">
      <FormField
        control={control}
        name="email"
        label="E-mail address"
        testID="sign-in-email"
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
        testID="sign-in-password"
        secureTextEntry
        autoComplete="current-password"
        autoCapitalize="none"
        onSubmitEditing={submit}
      />
      {failure ? <FormAlert tone="error" message={failure.message} testID="sign-in-error" /> : null}
      <SubmitButton
        label="Sign in"
        pendingLabel="Signing in…"
        pending={pending}
        onPress={submit}
        testID="sign-in-submit"
      />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: Spacing.md } });
