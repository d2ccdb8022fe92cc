import { StyleSheet, View } from 'react-native';
import type { RevisionDto } from '../../lib/contracts/library';
import { Spacing } from '../../lib/theme';
import { useTheme } from '../../lib/theme/use-theme';
import { Card } from '../ui/card';
import { Text } from '../ui/text';

const ORIGIN = { edit: 'Edited', import: 'Imported', correction: 'Correction accepted', revert: 'Reverted' } as const;

/** Who changed the spec, when, why and what. Newest first. */
export function RevisionList({ revisions }: { revisions: RevisionDto[] }) {
  const t = useTheme();
  return (
    <Card testID="revision-list">
      <Text variant="heading">History</Text>
      {revisions.length === 0 ? <Text color="textMuted">No recorded changes.</Text> : null}
      {revisions.map((r) => (
        <View key={r.id} style={[styles.row, { borderTopColor: t.border }]}>
          <Text variant="label">
            Version {r.version} · {ORIGIN[r.origin]}{r.originRef ? ` (${r.originRef})` : ''}
          </Text>
          <Text variant="small" color="textMuted">{new Date(r.createdAt).toLocaleString()} · {r.authorName}</Text>
          <Text variant="small">{r.reason}</Text>
          {r.changedFields.length && r.changedFields[0] !== 'created' ? (
            <Text variant="small" color="textMuted">Changed: {r.changedFields.join(', ')}</Text>
          ) : null}
        </View>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { borderTopWidth: StyleSheet.hairlineWidth, paddingTop: Spacing.sm, gap: 2 },
});
