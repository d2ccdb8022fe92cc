import { Pressable, StyleSheet, View } from 'react-native';
import { Radius, Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Text } from '../ui/text';

export type MemoryChip = { key: string; text: string; onClear: () => void };

/** Values taken from the last check, each said so, each with its own "clear". */
export function MemoryChips({ chips }: { chips: MemoryChip[] }) {
  const t = useTheme();
  if (!chips.length) return null;
  return (
    <View style={styles.row} testID="memory-chips">
      {chips.map((c) => (
        <View key={c.key} style={[styles.chip, { borderColor: t.border, backgroundColor: t.surfaceMuted }]}>
          <Text variant="small">{`${c.text} — from your last check`}</Text>
          <Pressable
            accessibilityRole="button"
            accessibilityLabel={`Clear ${c.text}`}
            onPress={c.onClear}
            style={styles.clear}
            testID={`memory-clear-${c.key}`}
          >
            <Text variant="small" color="primary">
              clear
            </Text>
          </Pressable>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: Spacing.xs },
  chip: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: Spacing.sm,
    borderWidth: 1,
    borderRadius: Radius.lg,
    paddingLeft: Spacing.sm,
  },
  clear: { minHeight: 44, minWidth: 44, justifyContent: 'center', paddingHorizontal: Spacing.sm },
});
