import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { Spacing } from '@/lib/theme';
import { useIsWide } from '@/lib/theme/use-theme';

export type MainAndSideProps = { main: ReactNode; side?: ReactNode; mainTestID?: string };

/** A main column and a 380 px side column on wide screens; on a phone the side follows the main. */
export function MainAndSide({ main, side, mainTestID }: MainAndSideProps) {
  const wide = useIsWide();
  return (
    <View style={[styles.columns, wide && styles.columnsWide]}>
      <View style={styles.main} testID={mainTestID}>
        {main}
      </View>
      {side ? <View style={[styles.side, wide && styles.sideWide]}>{side}</View> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  columns: { gap: Spacing.lg },
  columnsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  main: { flex: 1, minWidth: 0, gap: Spacing.md },
  side: { gap: Spacing.md },
  sideWide: { width: 380 },
});
