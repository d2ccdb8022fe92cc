import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Redirect, useRouter } from 'expo-router';
import { AccountSummary } from '@/components/account/account-summary';
import { ChangePasswordForm } from '@/components/account/change-password-form';
import { FormAlert } from '@/components/ui/form-alert';
import { FormPanel } from '@/components/ui/form-panel';
import { formFailure } from '@/components/ui/form-failure';
import { Button } from '@/components/ui/button';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { LoadingState } from '@/components/ui/states';
import { useChangePasswordMutation, useSignOutEverywhereMutation } from '@/lib/hooks/use-auth';
import { useSession } from '@/lib/session/session-provider';
import { Spacing } from '@/lib/theme';
import { useIsWide } from '@/lib/theme/use-theme';

export default function AccountScreen() {
  const router = useRouter();
  const wide = useIsWide();
  const session = useSession();
  const change = useChangePasswordMutation();
  const everywhere = useSignOutEverywhereMutation();
  // Set when this screen signs out, so it goes home instead of to the sign-in page.
  const [leaving, setLeaving] = useState(false);
  const [formKey, setFormKey] = useState(0);

  const leave = async (how: () => Promise<unknown>) => {
    setLeaving(true);
    try {
      await how();
      router.replace('/');
    } catch {
      setLeaving(false);
    }
  };

  if (session.status === 'restoring' || leaving)
    return (
      <Screen>
        <LoadingState label={leaving ? 'Signing out' : 'Loading your account'} />
      </Screen>
    );
  if (!session.user) return <Redirect href="/sign-in" />;
  const user = session.user;

  return (
    <Screen testID="account-screen">
      <View style={[styles.columns, wide && styles.columnsWide]}>
        <View style={[styles.column, wide && styles.columnWide]}>
          <AccountSummary user={user} />
          {session.can('admin') ? (
            <Button
              label="Manage users and roles"
              variant="secondary"
              onPress={() => router.push('/admin/users')}
              testID="to-admin-users"
            />
          ) : null}
          <FormPanel
            title="Sessions"
            intro="Signing out everywhere ends the sessions on every phone and computer, this one included."
          >
            {everywhere.error ? <FormAlert tone="error" message={formFailure(everywhere.error)!.message} /> : null}
            <Button label="Sign out" onPress={() => leave(session.signOut)} testID="sign-out" />
            <Button
              label={everywhere.isPending ? 'Signing out everywhere…' : 'Sign out everywhere'}
              variant="secondary"
              disabled={everywhere.isPending}
              onPress={() => leave(() => everywhere.mutateAsync())}
              testID="sign-out-everywhere"
            />
          </FormPanel>
        </View>
        <View style={[styles.column, wide && styles.columnWide]}>
          <FormPanel title="Change password" intro="Other devices are signed out when the password changes.">
            <ChangePasswordForm
              key={formKey}
              pending={change.isPending}
              failure={formFailure(change.error, { password: 'newPassword' })}
              done={change.isSuccess ? 'Password changed. This device stays signed in.' : null}
              onSubmit={(values) => change.mutate(values, { onSuccess: () => setFormKey((k) => k + 1) })}
            />
          </FormPanel>
          <Text variant="small" color="textMuted">
            Forgotten the current password? Sign out and use “Forgot your password?” on the sign-in page.
          </Text>
        </View>
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  columns: { gap: Spacing.lg },
  columnsWide: { flexDirection: 'row', alignItems: 'flex-start', justifyContent: 'center' },
  column: { gap: Spacing.lg, width: '100%', maxWidth: 480, alignSelf: 'center' },
  columnWide: { flex: 1, alignSelf: 'flex-start' },
});
