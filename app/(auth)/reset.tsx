import { useLocalSearchParams, useRouter } from 'expo-router';
import { FormAlert } from '@/components/ui/form-alert';
import { FormPanel } from '@/components/ui/form-panel';
import { formFailure } from '@/components/ui/form-failure';
import { ResetPasswordForm } from '@/components/account/reset-password-form';
import { Button } from '@/components/ui/button';
import { Screen } from '@/components/ui/screen';
import { ApiError } from '@/lib/api/client';
import { useResetPasswordMutation } from '@/lib/hooks/use-auth';

const LINK_CODES = new Set(['invalid_token', 'token_used', 'token_expired']);

/** Opened from the password-reset e-mail: a new password, typed twice. */
export default function ResetScreen() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const router = useRouter();
  const reset = useResetPasswordMutation();
  const newLink = (
    <Button
      label="Ask for a new link"
      variant="secondary"
      onPress={() => router.replace('/forgot')}
      testID="reset-new-link"
    />
  );

  if (!token) {
    return (
      <Screen testID="reset-screen">
        <FormPanel title="No link to check">
          <FormAlert tone="error" message="Open this page from the link in the password-reset e-mail." />
          {newLink}
        </FormPanel>
      </Screen>
    );
  }
  if (reset.isSuccess) {
    return (
      <Screen testID="reset-screen">
        <FormPanel title="Password changed" testID="reset-done">
          <FormAlert
            tone="success"
            message="Your new password is set, and every device that was signed in has been signed out."
          />
          <Button label="Sign in" onPress={() => router.replace('/sign-in')} />
        </FormPanel>
      </Screen>
    );
  }
  const linkFailed = reset.error instanceof ApiError && LINK_CODES.has(reset.error.code);
  return (
    <Screen testID="reset-screen">
      <FormPanel title="Choose a new password" intro="The link works once, for 30 minutes.">
        <ResetPasswordForm
          pending={reset.isPending}
          failure={formFailure(reset.error)}
          onSubmit={(password) => reset.mutate({ token, password })}
        />
        {linkFailed ? newLink : null}
      </FormPanel>
    </Screen>
  );
}
