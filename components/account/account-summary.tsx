import { StyleSheet, View } from 'react-native';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import type { RoleValue, UserDto } from '@/lib/contracts/auth';
import { Spacing } from '@/lib/theme';

export const ROLE_LABELS: Record<RoleValue, string> = { contributor: 'Contributor', editor: 'Editor', admin: 'Admin' };
const ROLE_MEANS: Record<RoleValue, string> = {
  contributor: 'You can propose corrections; an editor reviews them.',
  editor: 'You curate the spec tables, import CSV files and review corrections.',
  admin: 'You curate the library and manage accounts and roles.',
};

export type AccountSummaryProps = { user: UserDto };

/** Who is signed in: name, address and what the role allows. */
export function AccountSummary({ user }: AccountSummaryProps) {
  return (
    <Card testID="account-summary">
      <Text variant="label" color="textMuted">
        Signed in as
      </Text>
      <Text variant="title">{user.displayName}</Text>
      <Text>{user.email}</Text>
      <View style={styles.role}>
        <Text variant="label" color="textMuted">
          Role
        </Text>
        <Text variant="heading" testID="account-role">
          {ROLE_LABELS[user.role]}
        </Text>
        <Text color="textMuted">{ROLE_MEANS[user.role]}</Text>
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({ role: { gap: Spacing.xs, marginTop: Spacing.sm } });
