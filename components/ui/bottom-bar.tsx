import { StyleSheet, View } from 'react-native';
import { usePathname, useRouter, type Href } from 'expo-router';
import { useHydrated } from '@/lib/hooks/use-hydrated';
import { useSession } from '@/lib/session/session-provider';
import { Spacing } from '@/lib/theme';
import { useIsWide, useTheme } from '@/lib/theme/use-theme';
import { LinkRow } from './link-row';
import { Text } from './text';

type Item = { label: string; href: Href & string; match: (path: string) => boolean };

const SEARCH: Item = { label: 'Search', href: '/', match: (p) => p === '/' || /^\/(models|specs)\//.test(p) };
const CALCULATOR: Item = { label: 'Calculator', href: '/calculator', match: (p) => p === '/calculator' };
const JOBS: Item = { label: 'Jobs', href: '/jobs', match: (p) => p.startsWith('/jobs') };
const REVIEW: Item = { label: 'Review', href: '/review', match: (p) => p.startsWith('/review') };

/**
 * The phone's navigation: a compact bar at the bottom reaching Search, Calculator, Jobs (signed in) and
 * Review (editors). Wide screens have room for these on the home screen and in the header, so none there.
 */
export function BottomBar() {
  const wide = useIsWide();
  const t = useTheme();
  const router = useRouter();
  const path = usePathname();
  const { status, can } = useSession();
  const hydrated = useHydrated();
  if (wide || !hydrated) return null;
  const items = [SEARCH, CALCULATOR, ...(status === 'signed-in' ? [JOBS] : []), ...(can('editor') ? [REVIEW] : [])];
  return (
    <View
      role="navigation"
      aria-label="Main"
      style={[styles.bar, { backgroundColor: t.surface, borderTopColor: t.border }]}
      testID="bottom-bar"
    >
      {items.map((item) => {
        const current = item.match(path);
        return (
          <LinkRow
            key={item.href}
            href={item.href}
            accessibilityLabel={item.label}
            aria-current={current ? 'page' : undefined}
            focusInset
            onPress={() => (current ? undefined : router.navigate(item.href))}
            style={[styles.item, current && { borderTopColor: t.primary }]}
            testID={`bottom-bar-${item.label.toLowerCase()}`}
          >
            <Text variant="label" color={current ? 'primary' : 'textMuted'}>
              {item.label}
            </Text>
          </LinkRow>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { flexDirection: 'row', borderTopWidth: 1 },
  item: {
    flex: 1,
    minHeight: 48,
    alignItems: 'center',
    justifyContent: 'center',
    paddingHorizontal: Spacing.xs,
    borderTopWidth: 3,
    borderTopColor: 'transparent',
  },
});
