import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { AuditList } from '@/components/account/audit-list';
import { FormAlert } from '@/components/ui/form-alert';
import { FormPanel } from '@/components/ui/form-panel';
import { formFailure } from '@/components/ui/form-failure';
import { UserRow } from '@/components/account/user-row';
import { ROLE_LABELS } from '@/components/account/account-summary';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { MainAndSide } from '@/components/ui/main-and-side';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/states';
import { describeError } from '@/lib/api/describe-error';
import type { UserDto } from '@/lib/contracts/auth';
import { useUpdateUserMutation, useUserAuditQuery, useUsersQuery } from '@/lib/hooks/use-auth';
import { useDebouncedValue } from '@/lib/hooks/use-debounced-value';
import { useSession } from '@/lib/session/session-provider';
import { Spacing } from '@/lib/theme';
import { useIsWide } from '@/lib/theme/use-theme';

export default function UsersScreen() {
  const router = useRouter();
  const session = useSession();
  if (session.status === 'restoring')
    return (
      <Screen>
        <LoadingState label="Checking your account" />
      </Screen>
    );
  if (!session.can('admin')) {
    return (
      <Screen testID="users-screen">
        <FormPanel
          title="Admins only"
          testID="admins-only"
          intro="Managing accounts and roles is for administrators. Ask an admin if you need another role."
        >
          {session.user ? (
            <Button label="Back to the library" onPress={() => router.replace('/')} />
          ) : (
            <Button label="Sign in" onPress={() => router.push('/sign-in')} />
          )}
        </FormPanel>
      </Screen>
    );
  }
  return <UserAdmin selfId={session.user!.id} />;
}

function UserAdmin({ selfId }: { selfId: number }) {
  const wide = useIsWide();
  const [text, setText] = useState('');
  const [selected, setSelected] = useState<UserDto | null>(null);
  const users = useUsersQuery(useDebouncedValue(text, 250));
  const update = useUpdateUserMutation();
  const [notice, setNotice] = useState<string | null>(null);
  /** Sends the change, then says what happened (announced: FormAlert is a live region). */
  const change = (u: UserDto, patch: { role: UserDto['role'] } | { disabled: boolean }) => {
    setNotice(null);
    update.mutate(
      { id: u.id, ...patch },
      {
        onSuccess: () =>
          setNotice(
            'role' in patch
              ? `${u.displayName} is now ${ROLE_LABELS[patch.role]}.`
              : patch.disabled
                ? `${u.displayName}’s account is disabled.`
                : `${u.displayName}’s account is enabled again.`,
          ),
      },
    );
  };
  const busyId = update.isPending ? update.variables.id : null;
  const toggle = (u: UserDto) => setSelected(selected?.id === u.id ? null : u);

  const list = () => {
    if (users.isPending) return <LoadingState label="Loading users" />;
    if (users.error) return <ErrorState message={describeError(users.error)} onRetry={users.refetch} />;
    if (users.data.length === 0)
      return <EmptyState message={text.trim() ? `No account matches “${text.trim()}”.` : 'No accounts yet.'} />;
    return users.data.map((u) => (
      <View key={u.id} style={styles.item}>
        <UserRow
          user={u}
          isSelf={u.id === selfId}
          busy={busyId === u.id}
          selected={selected?.id === u.id}
          onRole={(role) => change(u, { role })}
          onDisabled={(disabled) => change(u, { disabled })}
          onSelect={() => toggle(u)}
        />
        {!wide && selected?.id === u.id ? <AuditSection user={u} /> : null}
      </View>
    ));
  };

  return (
    <Screen testID="users-screen">
      <View style={styles.intro}>
        <Text variant="title">Users and roles</Text>
        <Text color="textMuted">
          Contributors propose corrections, editors curate the library, admins also manage accounts. Every change is
          recorded.
        </Text>
      </View>
      <TextField
        label="Search users"
        placeholder="Name or e-mail address"
        value={text}
        onChangeText={setText}
        autoCapitalize="none"
        autoCorrect={false}
        inputMode="search"
        testID="users-search"
        style={styles.search}
      />
      {notice ? <FormAlert tone="success" message={notice} testID="users-notice" /> : null}
      {update.error ? (
        <FormAlert tone="error" message={formFailure(update.error)!.message} testID="users-error" />
      ) : null}
      <MainAndSide
        mainTestID="users-list"
        main={list()}
        side={
          wide ? (
            selected ? (
              <AuditSection user={selected} />
            ) : (
              <EmptyState message="Choose “Show history” on an account to see its changes." />
            )
          ) : null
        }
      />
    </Screen>
  );
}

function AuditSection({ user }: { user: UserDto }) {
  const audit = useUserAuditQuery(user.id);
  const body = () => {
    if (audit.isPending) return <LoadingState label="Loading the history" />;
    if (audit.error) return <ErrorState message={describeError(audit.error)} onRetry={audit.refetch} />;
    if (audit.data.length === 0) return <EmptyState message="No changes recorded for this account." />;
    return <AuditList entries={audit.data} />;
  };
  return (
    <Card testID="audit-panel">
      <Text variant="heading">History of {user.displayName}</Text>
      {body()}
    </Card>
  );
}

const styles = StyleSheet.create({
  intro: { gap: Spacing.xs },
  search: { maxWidth: 480 },
  item: { gap: Spacing.sm },
});
