import { StyleSheet, View } from 'react-native';
import { Button } from '../ui/button';
import { TextField } from '../ui/text-field';
import { SignInBody } from '@/lib/contracts/auth';
import { Spacing } from '@/lib/theme';
import { FormAlert } from './form-alert';
import { useFormState, type FormFailure } from './form-state';

export type SignInFormProps = {
  onSubmit: (values: SignInBody) => void;
  pending?: boolean;
  failure?: FormFailure | null;
};

export function SignInForm({ onSubmit, pending = false, failure }: SignInFormProps) {
  const form = useFormState({ email: '', password: '' });
  const error = (k: 'email' | 'password') => form.errors[k] ?? failure?.fields[k];
  const submit = () => {
    const data = form.check(SignInBody, form.values);
    if (data) onSubmit(data);
  };
  return (
    <View style={styles.form} testID="sign-in-form">
      <TextField
        label="E-mail address"
        {...form.field('email')}
        error={error('email')}
        testID="sign-in-email"
        inputMode="email"
        keyboardType="email-address"
        autoComplete="email"
        autoCapitalize="none"
        autoCorrect={false}
      />
      <TextField
        label="Password"
        {...form.field('password')}
        error={error('password')}
        testID="sign-in-password"
        secureTextEntry
        autoComplete="current-password"
        autoCapitalize="none"
        onSubmitEditing={submit}
      />
      {failure ? <FormAlert tone="error" message={failure.message} testID="sign-in-error" /> : null}
      <Button label={pending ? 'Signing in…' : 'Sign in'} onPress={submit} disabled={pending} testID="sign-in-submit" />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: Spacing.md } });
