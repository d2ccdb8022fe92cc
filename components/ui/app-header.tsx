import { Pressable, StyleSheet } from 'react-native';
import { usePathname, useRouter } from 'expo-router';
import { Spacing } from '@/lib/theme';
import { useHydrated } from '@/lib/hooks/use-hydrated';
import { useTheme } from '@/lib/theme/use-theme';
import { focusRing } from './focus-ring';
import { LinkRow } from './link-row';
import { Text } from './text';

/**
 * The header's left action on every screen: "Back" when the app has history to go back to, and
 * "Home" when it has none (a page opened from an e-mail, a bookmark or a reload). Nothing on the home
 * screen itself. The browser's own back and forward keep working: this only calls router.back().
 */
export function HeaderBack() {
  const router = useRouter();
  const path = usePathname();
  const t = useTheme();
  const hydrated = useHydrated();
  if (!hydrated) return null;
  if (router.canGoBack())
    return (
      <Pressable
        accessibilityRole="button"
        accessibilityLabel="Back"
        onPress={() => router.back()}
        style={(state) => [styles.action, focusRing(t, (state as { focused?: boolean }).focused)]}
        testID="header-back"
      >
        <Text variant="label" color="primary">
          ‹ Back
        </Text>
      </Pressable>
    );
  if (path === '/') return null;
  return (
    <LinkRow
      href="/"
      accessibilityLabel="Home: search the library"
      onPress={() => router.replace('/')}
      style={styles.action}
      testID="header-home"
    >
      <Text variant="label" color="primary">
        ‹ Home
      </Text>
    </LinkRow>
  );
}

const styles = StyleSheet.create({
  action: { minHeight: 44, minWidth: 44, justifyContent: 'center', paddingHorizontal: Spacing.md },
});
