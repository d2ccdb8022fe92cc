import { useEffect, useState, useSyncExternalStore } from 'react';
import { StyleSheet, View } from 'react-native';
import { useQueryClient } from '@tanstack/react-query';
import { useOnline } from '@/lib/hooks/use-online';
import { useReadingQueue } from '@/lib/hooks/use-reading-queue';
import { waitingMessage } from '@/lib/offline/reading-queue';
import { offlineLine } from '@/lib/offline/saved-age';
import { applyUpdate, subscribeUpdate, updateWaiting } from '@/lib/offline/service-worker';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Button } from '../ui/button';
import { Text } from '../ui/text';

/**
 * One line under the header for what the device is doing on its own: offline (and how old
 * the kept copy is), readings waiting to be sent, and a new build ready to load.
 */
export function AppStatus() {
  const t = useTheme();
  const qc = useQueryClient();
  const online = useOnline();
  const update = useSyncExternalStore(subscribeUpdate, updateWaiting, () => false);
  const queue = useReadingQueue();
  const waiting = queue.pendingCount + queue.queuedJobs.length;
  const now = useMinuteClock();
  const cache = qc.getQueryCache();
  const saved = useSyncExternalStore(
    (fn) => cache.subscribe(fn),
    () => newestAnswer(cache.getAll()),
    () => null,
  );
  if (online && !update && waiting === 0) return null;
  return (
    <View style={[styles.bar, { backgroundColor: t.surfaceMuted, borderBottomColor: t.border }]}>
      {!online ? (
        <Text variant="small" testID="offline-line" accessibilityRole="alert">
          {offlineLine(saved, now)}
        </Text>
      ) : null}
      {waiting > 0 ? (
        <Text variant="small" testID="header-queue">
          {waitingMessage(queue.pendingCount, queue.queuedJobs.length)}
        </Text>
      ) : null}
      {update ? (
        <View style={styles.update} testID="update-available">
          <Text variant="small">Update available — reload to use it.</Text>
          <Button label="Reload" variant="quiet" onPress={applyUpdate} style={styles.reload} />
        </View>
      ) : null}
    </View>
  );
}

/** When the newest answer in the cache (restored from the device, or fetched) arrived. */
function newestAnswer(queries: { state: { dataUpdatedAt: number } }[]): number | null {
  const newest = Math.max(0, ...queries.map((q) => q.state.dataUpdatedAt));
  return newest > 0 ? newest : null;
}

/** The time, renewed every minute (for "saved 5 min ago"). */
function useMinuteClock() {
  const [now, setNow] = useState(0);
  useEffect(() => {
    const tick = () => setNow(Date.now());
    const first = setTimeout(tick, 0);
    const timer = setInterval(tick, 60_000);
    return () => {
      clearTimeout(first);
      clearInterval(timer);
    };
  }, []);
  return now;
}

const styles = StyleSheet.create({
  bar: {
    paddingHorizontal: Spacing.md,
    paddingVertical: Spacing.xs,
    gap: Spacing.xs,
    borderBottomWidth: StyleSheet.hairlineWidth,
  },
  update: { flexDirection: 'row', alignItems: 'center', gap: Spacing.sm, flexWrap: 'wrap' },
  reload: { paddingHorizontal: 0, minHeight: 32 },
});
