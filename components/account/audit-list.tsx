import { StyleSheet, View } from 'react-native';
import { Text } from '../ui/text';
import type { UserAuditDto } from '@/lib/contracts/auth';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';

export type AuditListProps = { entries: UserAuditDto[] };

/** "Role changed from Contributor to Editor", "Account disabled" … */
export function describeAudit(e: UserAuditDto): string {
  if (e.action === 'role_changed') return `Role changed from ${e.fromValue ?? '—'} to ${e.toValue ?? '—'}`;
  if (e.action === 'disabled') return 'Account disabled';
  if (e.action === 'enabled') return 'Account enabled';
  return e.action.replace(/_/g, ' ');
}

/** Changes made to one account, newest first, with who made them and when. */
export function AuditList({ entries }: AuditListProps) {
  const t = useTheme();
  return (
    <View style={styles.list} testID="audit-list">
      {entries.map((e) => (
        <View key={e.id} style={[styles.item, { borderColor: t.border }]} testID={`audit-${e.id}`}>
          <Text>{describeAudit(e)}</Text>
          <Text variant="small" color="textMuted">
            {new Date(e.createdAt).toLocaleString()} · by {e.actorName}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: Spacing.sm },
  item: { borderTopWidth: 1, paddingTop: Spacing.sm, gap: Spacing.xs },
});
