import { StyleSheet, View } from 'react-native';
import { waitingMessage, type QueuedReading, type RejectedReading } from '@/lib/offline/reading-queue';
import { formatNumber } from '@/lib/units';
import { Radius, Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Button } from '../ui/button';
import { Text } from '../ui/text';

export type QueueNoticeProps = {
  pending: QueuedReading[];
  rejected: RejectedReading[];
  onDismiss: (key: string) => void;
};

/** What this device still holds for the job: readings waiting for a connection, and any the server refused. */
export function QueueNotice({ pending, rejected, onDismiss }: QueueNoticeProps) {
  const t = useTheme();
  if (pending.length === 0 && rejected.length === 0) return null;
  return (
    <View style={styles.wrap}>
      {pending.length ? (
        <View
          testID="queue-waiting"
          accessibilityRole="alert"
          style={[styles.box, { borderColor: t.primary, backgroundColor: t.surfaceMuted }]}
        >
          <Text variant="label">{waitingMessage(pending.length)}.</Text>
          <Text variant="small" color="textMuted">
            They are kept on this device; nothing is lost if you close the app.
          </Text>
        </View>
      ) : null}
      {rejected.map((r) => (
        <View
          key={r.key}
          testID="queue-rejected"
          accessibilityRole="alert"
          style={[styles.box, { borderColor: t.fail, backgroundColor: t.failSurface }]}
        >
          <Text variant="label" color="fail">
            Not saved: {r.preview.label}, {formatNumber(r.preview.value)} {r.preview.unit}
          </Text>
          <Text variant="small">{r.message}</Text>
          <Button label="Dismiss" variant="quiet" onPress={() => onDismiss(r.key)} style={styles.dismiss} />
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: Spacing.sm },
  box: { borderWidth: 1, borderLeftWidth: 6, borderRadius: Radius.md, padding: Spacing.md, gap: Spacing.xs },
  dismiss: { alignSelf: 'flex-start', paddingHorizontal: 0 },
});
