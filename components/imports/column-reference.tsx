import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useColumnReferenceQuery } from '@/lib/hooks/use-curation';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Button } from '../ui/button';
import { Text } from '../ui/text';

/** What each CSV column holds, whether it is required, and an example; folded away until asked for. */
export function ColumnReference({ initiallyOpen = false }: { initiallyOpen?: boolean }) {
  const t = useTheme();
  const [open, setOpen] = useState(initiallyOpen);
  const columns = useColumnReferenceQuery().data ?? [];
  return (
    <View style={styles.wrap} testID="column-reference">
      <Button
        label={open ? 'Hide the column reference' : `Show the column reference (${columns.length} columns)`}
        variant="quiet"
        style={styles.toggle}
        onPress={() => setOpen(!open)}
        testID="toggle-columns"
      />
      {open
        ? columns.map((c) => (
            <View key={c.column} style={[styles.row, { borderTopColor: t.border }]}>
              <Text variant="label">
                {c.column}
                {c.required ? ' (required)' : ''}
              </Text>
              <Text variant="small">{c.description}</Text>
              <Text variant="small" color="textMuted">
                e.g. {c.example}
              </Text>
            </View>
          ))
        : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: Spacing.xs },
  toggle: { alignSelf: 'flex-start', paddingHorizontal: 0 },
  row: { borderTopWidth: StyleSheet.hairlineWidth, paddingTop: Spacing.xs, gap: 2 },
});
