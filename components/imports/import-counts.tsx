import { StyleSheet, View } from 'react-native';
import type { ImportCountsDto } from '@/lib/contracts/imports';
import { Radius, Spacing, type ThemeColor } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Text } from '../ui/text';

const BOXES: { key: keyof ImportCountsDto; label: string; color: ThemeColor; surface: ThemeColor }[] = [
  { key: 'created', label: 'Created', color: 'pass', surface: 'passSurface' },
  { key: 'updated', label: 'Updated', color: 'primary', surface: 'surfaceMuted' },
  { key: 'unchanged', label: 'Unchanged', color: 'textMuted', surface: 'surfaceMuted' },
  { key: 'rejected', label: 'Rejected', color: 'fail', surface: 'failSurface' },
  { key: 'warnings', label: 'Warnings', color: 'marginal', surface: 'marginalSurface' },
];

/** The five totals of a batch, each with its word (never colour alone). */
export function ImportCounts({ counts }: { counts: ImportCountsDto }) {
  const t = useTheme();
  return (
    <View style={styles.row} testID="import-counts">
      {BOXES.map((b) => (
        <View
          key={b.key}
          style={[styles.box, { backgroundColor: counts[b.key] ? t[b.surface] : t.surface, borderColor: t.border }]}
          accessibilityLabel={`${counts[b.key]} ${b.label.toLowerCase()}`}
          testID={`count-${b.key}`}
        >
          <Text variant="value" color={counts[b.key] ? b.color : 'textMuted'}>
            {counts[b.key]}
          </Text>
          <Text variant="small" color="textMuted">
            {b.label}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: Spacing.sm },
  box: {
    minWidth: 96,
    flexGrow: 1,
    flexBasis: 96,
    borderWidth: 1,
    borderRadius: Radius.md,
    padding: Spacing.sm,
    alignItems: 'center',
  },
});
