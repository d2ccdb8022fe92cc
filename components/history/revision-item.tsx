import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import type { RevisionDiffDto } from '@/lib/contracts/curation';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Text } from '../ui/text';
import { FieldChanges } from './field-changes';

const ORIGIN = { edit: 'Edited', import: 'Imported', correction: 'Correction accepted', revert: 'Reverted' } as const;

/** "Imported (batch #12)", "Reverted (to version 2)": how the revision came about and from what. */
export function originText(r: RevisionDiffDto, all: RevisionDiffDto[]): string {
  if (r.origin === 'edit' && r.changedFields[0] === 'created') return 'Created';
  if (!r.originRef) return ORIGIN[r.origin];
  const target = r.origin === 'revert' ? all.find((x) => `revision #${x.id}` === r.originRef) : undefined;
  return `${ORIGIN[r.origin]} (${target ? `to version ${target.version}` : r.originRef})`;
}

export type RevisionItemProps = { revision: RevisionDiffDto; origin: string; current: boolean; children?: ReactNode };

/** One revision: version, origin, who, when, why, and what changed against the one before. */
export function RevisionItem({ revision: r, origin, current, children }: RevisionItemProps) {
  const t = useTheme();
  const created = r.changedFields[0] === 'created';
  return (
    <View style={[styles.row, { borderTopColor: t.border }]} testID={`revision-${r.version}`}>
      <Text variant="label">
        Version {r.version}
        {current ? ' (current)' : ''} · {origin}
      </Text>
      <Text variant="small" color="textMuted">
        {new Date(r.createdAt).toLocaleString()} · {r.authorName}
      </Text>
      <Text variant="small">{r.reason}</Text>
      {created ? (
        <Text variant="small" color="textMuted">
          Created with:
        </Text>
      ) : null}
      <FieldChanges changes={r.changes} created={created} testID={`revision-${r.version}-changes`} />
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { borderTopWidth: StyleSheet.hairlineWidth, paddingTop: Spacing.sm, gap: 2 },
});
