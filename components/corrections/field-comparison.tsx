import { StyleSheet, View } from 'react-native';
import type { CorrectionReviewDto } from '@/lib/contracts/corrections';
import { FIELD_LABEL } from '@/lib/contracts/spec-fields';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Text } from '../ui/text';

const LABEL = FIELD_LABEL;
const show = (v: unknown) => (v === null || v === undefined || v === '' ? '—' : String(v));

/** Field by field: the values when proposed (if they changed since), now, and as proposed. */
export function FieldComparison({ review }: { review: CorrectionReviewDto }) {
  const t = useTheme();
  const columns = review.stale
    ? ['When proposed', 'Now', 'Proposed']
    : review.kind === 'change'
      ? ['Now', 'Proposed']
      : ['Proposed'];
  return (
    <View testID="field-comparison" accessibilityRole="summary">
      <View style={[styles.row, { borderBottomColor: t.border }]}>
        <Text variant="label" style={styles.name}>
          Field
        </Text>
        {columns.map((c) => (
          <Text key={c} variant="label" style={styles.cell}>
            {c}
          </Text>
        ))}
      </View>
      {review.fields.map((f) => {
        const changed = show(f.current) !== show(f.proposed);
        const cells = review.stale
          ? [f.proposedAgainst, f.current, f.proposed]
          : review.kind === 'change'
            ? [f.current, f.proposed]
            : [f.proposed];
        return (
          <View
            key={f.field}
            style={[
              styles.row,
              { borderBottomColor: t.border, backgroundColor: changed ? t.marginalSurface : 'transparent' },
            ]}
          >
            <Text variant="small" style={styles.name}>
              {LABEL[f.field] ?? f.field}
              {changed ? ' (changes)' : ''}
            </Text>
            {cells.map((v, i) => (
              <Text key={i} variant="small" style={styles.cell} selectable>
                {show(v)}
              </Text>
            ))}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row',
    gap: Spacing.sm,
    paddingVertical: Spacing.xs,
    borderBottomWidth: StyleSheet.hairlineWidth,
  },
  name: { width: 110 },
  cell: { flex: 1, minWidth: 0 },
});
