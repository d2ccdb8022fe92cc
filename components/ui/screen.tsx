import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';

export type ScreenProps = { children: ReactNode; testID?: string; scroll?: boolean };

/** A page: themed background, centred column with a comfortable reading width. */
export function Screen({ children, testID, scroll = true }: ScreenProps) {
  const t = useTheme();
  const body = <View style={styles.column}>{children}</View>;
  return (
    <View testID={testID} style={[styles.root, { backgroundColor: t.background }]}>
      {scroll ? (
        <ScrollView contentContainerStyle={styles.scroll} keyboardShouldPersistTaps="handled">
          {body}
        </ScrollView>
      ) : (
        body
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1 },
  scroll: { flexGrow: 1 },
  column: { width: '100%', maxWidth: 1200, alignSelf: 'center', padding: Spacing.lg, gap: Spacing.lg },
});
