import { StyleSheet, View } from 'react-native';
import { Button } from '../ui/button';
import { TextField } from '../ui/text-field';
import { SignUpBody } from '@/lib/contracts/auth';
import { Spacing } from '@/lib/theme';
import { FormAlert } from './form-alert';
import { useFormState, type FormFailure } from './form-state';

export type SignUpFormProps = {
  onSubmit: (values: SignUpBody) => void;
  pending?: boolean;
  failure?: FormFailure | null;
};

export function SignUpForm({ onSubmit, pending = false, failure }: SignUpFormProps) {
  const form = useFormState({ displayName: '', email: '', password: '' });
  const error = (k: 'displayName' | 'email' | 'password') => form.errors[k] ?? failure?.fields[k];
  const submit = () => {
    const data = form.check(SignUpBody, form.values);
    if (data) onSubmit(data);
  };
  return (
    <View style={styles.form} testID="sign-up-form">
      <TextField
        label="Your name"
        {...form.field('displayName')}
        error={error('displayName')}
        testID="sign-up-name"
        hint="Shown beside your corrections and in the header."
        autoComplete="name"
        autoCapitalize="words"
      />
      <TextField
        label="E-mail address"
        {...form.field('email')}
        error={error('email')}
        testID="sign-up-email"
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
        testID="sign-up-password"
        hint="At least 12 characters; a short phrase is easiest to remember."
        secureTextEntry
        autoComplete="new-password"
        autoCapitalize="none"
        onSubmitEditing={submit}
      />
      {failure ? <FormAlert tone="error" message={failure.message} testID="sign-up-error" /> : null}
      <Button
        label={pending ? 'Creating the account…' : 'Create account'}
        onPress={submit}
        disabled={pending}
        testID="sign-up-submit"
      />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: Spacing.md } });
