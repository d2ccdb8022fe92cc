import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { Spacing } from '@/lib/theme';
import { useIsWide } from '@/lib/theme/use-theme';

export type TwoColumnsProps = { first: ReactNode; second: ReactNode };

/** Side by side on wide screens (each half the width); stacked on a phone, each as tall as its content. */
export function TwoColumns({ first, second }: TwoColumnsProps) {
  const wide = useIsWide();
  return (
    <View style={[styles.columns, wide && styles.columnsWide]}>
      <View style={[styles.column, wide && styles.columnWide]}>{first}</View>
      <View style={[styles.column, wide && styles.columnWide]}>{second}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  columns: { gap: Spacing.lg },
  columnsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  column: { gap: Spacing.lg, minWidth: 0 },
  columnWide: { flex: 1 },
});
