import { useEffect, useRef } from 'react';
import { useLocalSearchParams, useRouter } from 'expo-router';
import { FormAlert } from '@/components/ui/form-alert';
import { FormPanel } from '@/components/ui/form-panel';
import { formFailure } from '@/components/ui/form-failure';
import { Button } from '@/components/ui/button';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { LoadingState } from '@/components/ui/states';
import { ApiError } from '@/lib/api/client';
import { useVerifyEmailMutation } from '@/lib/hooks/use-auth';

/** Opened from the link in the verification e-mail: confirms the address once, on arrival. */
export default function VerifyScreen() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const router = useRouter();
  const verify = useVerifyEmailMutation();
  const { mutate } = verify;
  // A link works once: never send the same token twice (effects can run twice in development).
  const sent = useRef<string | null>(null);
  useEffect(() => {
    if (!token || sent.current === token) return;
    sent.current = token;
    mutate(token);
  }, [token, mutate]);

  const toSignIn = () => router.replace('/sign-in');
  const newLink = (variant: 'primary' | 'secondary' = 'primary') => (
    <>
      <Text color="textMuted">A password-reset link confirms the address too: ask for one and choose a password.</Text>
      <Button
        label="Send me a new link"
        variant={variant}
        onPress={() => router.replace('/forgot')}
        testID="verify-new-link"
      />
    </>
  );

  if (!token) {
    return (
      <Screen testID="verify-screen">
        <FormPanel title="No link to check">
          <FormAlert tone="error" message="Open this page from the link in the e-mail we sent you." />
          {newLink()}
        </FormPanel>
      </Screen>
    );
  }
  if (verify.isSuccess) {
    return (
      <Screen testID="verify-screen">
        <FormPanel title="Address confirmed" testID="verify-done">
          <FormAlert
            tone="success"
            message={`Thank you, ${verify.data.user.displayName}: ${verify.data.user.email} is confirmed. You can sign in now.`}
          />
          <Button label="Sign in" onPress={toSignIn} testID="verify-sign-in" />
        </FormPanel>
      </Screen>
    );
  }
  if (verify.isError) {
    const used = verify.error instanceof ApiError && verify.error.code === 'token_used';
    const offline = !(verify.error instanceof ApiError);
    return (
      <Screen testID="verify-screen">
        <FormPanel title="Link not accepted" testID="verify-failed">
          <FormAlert tone="error" message={formFailure(verify.error)!.message} />
          {used ? <Text>If you followed this link before, the address is already confirmed.</Text> : null}
          {used ? <Button label="Sign in" onPress={toSignIn} /> : null}
          {offline ? <Button label="Try again" variant="secondary" onPress={() => mutate(token)} /> : null}
          {newLink(used ? 'secondary' : 'primary')}
        </FormPanel>
      </Screen>
    );
  }
  return (
    <Screen testID="verify-screen">
      <LoadingState label="Confirming your address" />
    </Screen>
  );
}
