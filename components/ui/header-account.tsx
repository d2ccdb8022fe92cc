import { Pressable, StyleSheet } from 'react-native';
import { useRouter } from 'expo-router';
import { useSession } from '../../lib/session/session-provider';
import { Spacing } from '../../lib/theme';
import { Text } from './text';

/** The header's account entry: "Sign in", or the signed-in name opening the account screen. */
export function HeaderAccount() {
  const router = useRouter();
  const { status, user } = useSession();
  if (status === 'restoring') return null;
  const label = user ? user.displayName : 'Sign in';
  return (
    <Pressable
      accessibilityRole="link"
      accessibilityLabel={user ? `Account: ${user.displayName}` : 'Sign in'}
      onPress={() => router.push(user ? '/account' : '/sign-in')}
      style={styles.button}
      testID="header-account"
    >
      <Text variant="label" color="primary" numberOfLines={1}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({ button: { paddingHorizontal: Spacing.md, minHeight: 44, justifyContent: 'center', maxWidth: 180 } });
