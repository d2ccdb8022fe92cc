import { StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { FormPanel } from '@/components/ui/form-panel';
import { formFailure } from '@/components/ui/form-failure';
import { SignInForm } from '@/components/account/sign-in-form';
import { Button } from '@/components/ui/button';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { useSignInMutation } from '@/lib/hooks/use-auth';
import { useSession } from '@/lib/session/session-provider';
import { Spacing } from '@/lib/theme';

export default function SignInScreen() {
  const router = useRouter();
  const { status, user } = useSession();
  const signIn = useSignInMutation();
  const leave = () => (router.canGoBack() ? router.back() : router.replace('/'));

  if (status === 'signed-in' && user && signIn.isIdle) {
    return (
      <Screen testID="sign-in-screen">
        <FormPanel title="You are signed in" intro={`Signed in as ${user.displayName} (${user.email}).`}>
          <Button label="Open your account" onPress={() => router.replace('/account')} />
          <Button label="Back to the library" variant="secondary" onPress={() => router.replace('/')} />
        </FormPanel>
      </Screen>
    );
  }
  return (
    <Screen testID="sign-in-screen">
      <FormPanel
        title="Sign in"
        intro="Looking up specs needs no account; signing in lets you propose corrections and curate."
      >
        <SignInForm
          pending={signIn.isPending}
          failure={formFailure(signIn.error)}
          onSubmit={(values) => signIn.mutate(values, { onSuccess: leave })}
        />
        <View style={styles.links}>
          <Text color="textMuted">New here?</Text>
          <Button
            label="Create an account"
            variant="secondary"
            onPress={() => router.push('/sign-up')}
            testID="to-sign-up"
          />
          <Button
            label="Forgot your password?"
            variant="quiet"
            onPress={() => router.push('/forgot')}
            testID="to-forgot"
          />
        </View>
      </FormPanel>
    </Screen>
  );
}

const styles = StyleSheet.create({ links: { gap: Spacing.sm } });
