import { StyleSheet, View } from 'react-native';
import type { QueuedReading } from '@/lib/offline/reading-queue';
import { formatNumber } from '@/lib/units';
import { Radius, Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Text } from '../ui/text';
import { formatWhen } from './job-format';

export type PendingReadingRowProps = { item: QueuedReading };

/** A reading kept on this device until the connection returns; marked as waiting in words. */
export function PendingReadingRow({ item }: PendingReadingRowProps) {
  const t = useTheme();
  const p = item.preview;
  return (
    <View testID="pending-reading" style={[styles.row, { borderColor: t.border, backgroundColor: t.surfaceMuted }]}>
      <View style={styles.top}>
        <Text variant="label" style={styles.grow}>
          {p.label}
          {item.body.retakeOf !== undefined ? ' (re-take)' : ''}
        </Text>
        <Text variant="label" color="primary">
          Waiting to be sent
        </Text>
      </View>
      <Text>
        {p.text !== undefined ? `Meter showed: ${p.text}` : `Meter reading ${formatNumber(p.value)} ${p.unit}`}
        {p.verdict ? ` · ${p.verdict.toUpperCase()} on this device (the server confirms when it arrives)` : ''}
      </Text>
      <Text variant="small" color="textMuted">
        Taken {formatWhen(item.body.takenAt ?? item.queuedAt)}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: {
    borderWidth: 1,
    borderStyle: 'dashed',
    borderRadius: Radius.md,
    padding: Spacing.sm,
    gap: 2,
    marginTop: Spacing.sm,
  },
  top: { flexDirection: 'row', gap: Spacing.sm, alignItems: 'center', flexWrap: 'wrap' },
  grow: { flex: 1, minWidth: 140 },
});
