import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { Spacing } from '@/lib/theme';
import { Card } from '../ui/card';
import { Text } from '../ui/text';

export type ImportGroupProps = { title: string; total: number; note?: string; testID?: string; children: ReactNode };

/** One group of the preview (created, updated…): heading with the total, then its rows. */
export function ImportGroup({ title, total, note, testID, children }: ImportGroupProps) {
  return (
    <Card testID={testID}>
      <View style={styles.head}>
        <Text variant="heading">{title}</Text>
        <Text variant="label" color="textMuted">
          {total} {total === 1 ? 'row' : 'rows'}
        </Text>
      </View>
      {note ? (
        <Text variant="small" color="textMuted">
          {note}
        </Text>
      ) : null}
      {children}
    </Card>
  );
}

const styles = StyleSheet.create({
  head: {
    flexDirection: 'row',
    justifyContent: 'space-between',
    alignItems: 'baseline',
    gap: Spacing.sm,
    flexWrap: 'wrap',
  },
});
