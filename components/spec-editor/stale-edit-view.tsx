import { StyleSheet, View } from 'react-native';
import type { SpecDetailDto } from '@/lib/contracts/library';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Button } from '../ui/button';
import { Caution } from '../ui/caution';
import { Text } from '../ui/text';
import { fieldLabel, showValue } from '../history/field-labels';
import { EDITABLE_FIELDS, specToForm, type SpecFormValues } from './spec-form-values';

export type StaleEditViewProps = {
  /** The spec as it is now (the 409's `current`). */
  current: SpecDetailDto;
  /** The values the editor started from, and the version they had. */
  base: SpecFormValues;
  baseVersion: number;
  /** The editor's own values, and which fields they changed. */
  mine: SpecFormValues;
  changed: string[];
  busy: boolean;
  error?: string | null;
  onReapply: () => void;
  onEditMine: () => void;
  onDiscard: () => void;
};

const sourceText = (s: SpecFormValues['source']) =>
  [s.title, s.edition, s.page && `p. ${s.page}`, s.url].filter(Boolean).join(', ');
const valueOf = (v: SpecFormValues, f: string) =>
  f === 'source' ? sourceText(v.source) : v[f as (typeof EDITABLE_FIELDS)[number]];

/** A stale save: the current values and the editor's side by side; nothing is overwritten until the editor says so. */
export function StaleEditView({
  current,
  base,
  baseVersion,
  mine,
  changed,
  busy,
  error,
  onReapply,
  onEditMine,
  onDiscard,
}: StaleEditViewProps) {
  const t = useTheme();
  const now = specToForm(current);
  const rows = [...EDITABLE_FIELDS, 'source'].filter(
    (f) => changed.includes(f) || valueOf(now, f).trim() !== valueOf(base, f).trim(),
  );
  const latest = current.revisions[0];
  return (
    <View style={styles.box} testID="stale-edit-view">
      <Caution
        title="someone changed this spec while you were editing"
        lines={[
          `You started from version ${baseVersion}; it is now at version ${current.version}${latest ? ` (${latest.authorName}: “${latest.reason}”)` : ''}.`,
          'Nothing of yours was saved. Compare the values, then re-apply your changes on the current version or start again from it.',
        ]}
      />
      <View accessibilityRole="summary" testID="stale-comparison">
        <View style={[styles.row, { borderBottomColor: t.border }]}>
          <Text variant="label" style={styles.name}>
            Field
          </Text>
          <Text variant="label" style={styles.cell}>
            Now (version {current.version})
          </Text>
          <Text variant="label" style={styles.cell}>
            Yours
          </Text>
        </View>
        {rows.map((f) => {
          const theirs = valueOf(now, f).trim() !== valueOf(base, f).trim();
          const yours = changed.includes(f);
          const note = theirs && yours ? 'both changed' : theirs ? 'changed by them' : 'changed by you';
          return (
            <View
              key={f}
              testID={`stale-row-${f}`}
              style={[
                styles.row,
                { borderBottomColor: t.border, backgroundColor: theirs && yours ? t.marginalSurface : 'transparent' },
              ]}
            >
              <View style={styles.name}>
                <Text variant="small">{fieldLabel(f)}</Text>
                <Text variant="small" color="textMuted">
                  {note}
                </Text>
              </View>
              <Text variant="small" style={styles.cell} selectable>
                {showValue(valueOf(now, f), f)}
              </Text>
              <Text variant="small" style={styles.cell} selectable>
                {yours ? showValue(valueOf(mine, f), f) : 'unchanged'}
              </Text>
            </View>
          );
        })}
      </View>
      {error ? (
        <Text color="fail" accessibilityRole="alert">
          {error}
        </Text>
      ) : null}
      <View style={styles.buttons}>
        <Button
          label={busy ? 'Saving…' : 'Re-apply my changes on the current version'}
          disabled={busy}
          onPress={onReapply}
          testID="stale-reapply"
        />
        <Button
          label="Edit my changes first"
          variant="secondary"
          disabled={busy}
          onPress={onEditMine}
          testID="stale-edit-mine"
        />
        <Button
          label="Discard mine, start from the current version"
          variant="quiet"
          disabled={busy}
          onPress={onDiscard}
          testID="stale-discard"
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: Spacing.md, maxWidth: 720 },
  row: {
    flexDirection: 'row',
    gap: Spacing.sm,
    paddingVertical: Spacing.xs,
    borderBottomWidth: StyleSheet.hairlineWidth,
  },
  name: { width: 120 },
  cell: { flex: 1, minWidth: 0 },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: Spacing.sm },
});
