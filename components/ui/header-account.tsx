import { Pressable, StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { useCorrectionSummaryQuery } from '@/lib/hooks/use-corrections';
import { useSession } from '@/lib/session/session-provider';
import { Radius, Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Text } from './text';

/** The header's account entry ("Sign in" or the signed-in name) and, for editors, the review badge. */
export function HeaderAccount() {
  const router = useRouter();
  const t = useTheme();
  const { status, user, can } = useSession();
  const summary = useCorrectionSummaryQuery();
  if (status === 'restoring') return null;
  const pending = can('editor') ? (summary.data?.pendingForReview ?? 0) : 0;
  return (
    <View style={styles.row}>
      {pending > 0 ? (
        <Pressable
          accessibilityRole="link"
          accessibilityLabel={`${pending} corrections to review`}
          onPress={() => router.push('/review')}
          style={[styles.badge, { backgroundColor: t.marginalSurface, borderColor: t.marginal }]}
          testID="review-badge"
        >
          <Text variant="label" color="marginal">
            Review {pending}
          </Text>
        </Pressable>
      ) : null}
      <Pressable
        accessibilityRole="link"
        accessibilityLabel={user ? `Account: ${user.displayName}` : 'Sign in'}
        onPress={() => router.push(user ? '/account' : '/sign-in')}
        style={styles.button}
        testID="header-account"
      >
        <Text variant="label" color="primary" numberOfLines={1}>
          {user ? user.displayName : 'Sign in'}
        </Text>
      </Pressable>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: Spacing.xs },
  button: { paddingHorizontal: Spacing.md, minHeight: 44, justifyContent: 'center', maxWidth: 180 },
  badge: {
    borderWidth: 1,
    borderRadius: Radius.lg,
    paddingHorizontal: Spacing.sm,
    minHeight: 44,
    justifyContent: 'center',
  },
});
