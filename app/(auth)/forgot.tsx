import { useRouter } from 'expo-router';
import { DevMailHint } from '@/components/account/dev-mail-hint';
import { EmailForm } from '@/components/account/email-form';
import { FormAlert } from '@/components/ui/form-alert';
import { FormPanel } from '@/components/ui/form-panel';
import { formFailure } from '@/components/ui/form-failure';
import { Button } from '@/components/ui/button';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { useForgotPasswordMutation } from '@/lib/hooks/use-auth';

export default function ForgotScreen() {
  const router = useRouter();
  const forgot = useForgotPasswordMutation();

  if (forgot.isSuccess) {
    return (
      <Screen testID="forgot-screen">
        <FormPanel title="Check your e-mail" testID="forgot-done">
          <FormAlert
            tone="success"
            message={`If ${forgot.variables} has an account, a link to choose a new password is on its way.`}
          />
          <Text color="textMuted">
            The link works once and expires in 30 minutes. Following it also confirms the address.
          </Text>
          <DevMailHint />
          <Button label="Back to sign in" onPress={() => router.replace('/sign-in')} />
        </FormPanel>
      </Screen>
    );
  }
  return (
    <Screen testID="forgot-screen">
      <FormPanel
        title="Forgotten password"
        intro="We will e-mail you a link to choose a new password. The same link confirms an address that is not confirmed yet."
      >
        <EmailForm
          submitLabel={forgot.isPending ? 'Sending…' : 'Send the link'}
          pending={forgot.isPending}
          failure={formFailure(forgot.error)}
          onSubmit={(email) => forgot.mutate(email)}
        />
        <Button label="Back to sign in" variant="quiet" onPress={() => router.replace('/sign-in')} />
      </FormPanel>
    </Screen>
  );
}
