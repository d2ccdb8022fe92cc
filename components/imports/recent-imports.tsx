import { Pressable, StyleSheet } from 'react-native';
import { describeError } from '@/lib/api/describe-error';
import type { ImportBatchSummaryDto } from '@/lib/contracts/imports';
import { useImportsQuery } from '@/lib/hooks/use-curation';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Card } from '../ui/card';
import { EmptyState, ErrorState, LoadingState } from '../ui/states';
import { Text } from '../ui/text';

const STATUS = { previewed: 'previewed, not committed', committed: 'committed', failed: 'could not be read' } as const;

function summary(b: ImportBatchSummaryDto) {
  const c = b.counts;
  return b.status === 'failed'
    ? 'no rows read'
    : `${c.created} created · ${c.updated} updated · ${c.unchanged} unchanged · ${c.rejected} rejected`;
}

/** The last imports, newest first; pressing one opens its preview. */
export function RecentImports({ selectedId, onOpen }: { selectedId: number | null; onOpen: (id: number) => void }) {
  const t = useTheme();
  const batches = useImportsQuery();
  return (
    <Card testID="recent-imports">
      <Text variant="heading">Recent imports</Text>
      {batches.isPending ? (
        <LoadingState label="Loading recent imports" />
      ) : batches.error ? (
        <ErrorState message={describeError(batches.error)} onRetry={batches.refetch} />
      ) : batches.data.length === 0 ? (
        <EmptyState message="No imports yet." />
      ) : (
        batches.data.map((b) => (
          <Pressable
            key={b.id}
            accessibilityRole="link"
            accessibilityLabel={`Open import #${b.id}, ${b.fileName}`}
            onPress={() => onOpen(b.id)}
            style={[
              styles.row,
              { borderTopColor: t.border, backgroundColor: b.id === selectedId ? t.surfaceMuted : 'transparent' },
            ]}
            testID={`batch-${b.id}`}
          >
            <Text variant="label">
              #{b.id} {b.fileName} — {STATUS[b.status]}
            </Text>
            <Text variant="small" color="textMuted">
              {summary(b)}
            </Text>
            <Text variant="small" color="textMuted">
              {b.uploaderName} · {new Date(b.createdAt).toLocaleString()}
            </Text>
          </Pressable>
        ))
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { borderTopWidth: StyleSheet.hairlineWidth, paddingVertical: Spacing.xs, paddingHorizontal: Spacing.xs, gap: 2 },
});
