import { StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { DevMailHint } from '@/components/account/dev-mail-hint';
import { FormAlert } from '@/components/ui/form-alert';
import { FormPanel } from '@/components/ui/form-panel';
import { formFailure } from '@/components/ui/form-failure';
import { SignUpForm } from '@/components/account/sign-up-form';
import { Button } from '@/components/ui/button';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { useSignUpMutation } from '@/lib/hooks/use-auth';
import { Spacing } from '@/lib/theme';

export default function SignUpScreen() {
  const router = useRouter();
  const signUp = useSignUpMutation();

  if (signUp.isSuccess) {
    return (
      <Screen testID="sign-up-screen">
        <FormPanel title="Check your e-mail" testID="sign-up-done">
          <FormAlert
            tone="success"
            message={`We sent a message to ${signUp.variables.email}. Follow its link to confirm the address, then sign in.`}
          />
          <Text color="textMuted">
            The link works once and expires in 24 hours. Nothing arrived after a few minutes? Look in the spam folder,
            or ask for a password-reset link: it confirms the address too.
          </Text>
          <DevMailHint />
          <Button label="Go to sign in" onPress={() => router.replace('/sign-in')} />
          <Button label="Use another address" variant="secondary" onPress={() => signUp.reset()} />
        </FormPanel>
      </Screen>
    );
  }
  return (
    <Screen testID="sign-up-screen">
      <FormPanel
        title="Create an account"
        intro="An account lets you propose corrections to the library. An admin can give you another role later."
      >
        <SignUpForm
          pending={signUp.isPending}
          failure={formFailure(signUp.error)}
          onSubmit={(values) => signUp.mutate(values)}
        />
        <View style={styles.links}>
          <Text color="textMuted">Already have an account?</Text>
          <Button label="Sign in instead" variant="secondary" onPress={() => router.replace('/sign-in')} />
        </View>
      </FormPanel>
    </Screen>
  );
}

const styles = StyleSheet.create({ links: { gap: Spacing.sm } });
