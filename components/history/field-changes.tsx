import { StyleSheet, View } from 'react-native';
import type { FieldChangeDto } from '@/lib/contracts/curation';
import { Spacing } from '@/lib/theme';
import { Text } from '../ui/text';
import { fieldLabel, showValue } from './field-labels';

export type FieldChangesProps = {
  changes: FieldChangeDto[];
  testID?: string;
  /** A first revision: the values only, no arrows. */ created?: boolean;
};

/** Field by field, before → after (an empty value shows as —). */
export function FieldChanges({ changes, testID, created }: FieldChangesProps) {
  if (changes.length === 0) return null;
  return (
    <View style={styles.list} testID={testID}>
      {changes.map((c) => (
        <View key={c.field} style={styles.row}>
          <Text variant="small" color="textMuted" style={styles.name}>
            {fieldLabel(c.field)}
          </Text>
          {created ? (
            <Text variant="small" style={styles.value} selectable>
              {showValue(c.after, c.field)}
            </Text>
          ) : (
            <Text variant="small" style={styles.value} selectable>
              <Text variant="small" color="textMuted">
                {showValue(c.before, c.field)}
              </Text>{' '}
              → <Text variant="label">{showValue(c.after, c.field)}</Text>
            </Text>
          )}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: 2 },
  row: { flexDirection: 'row', gap: Spacing.sm },
  name: { width: 110 },
  value: { flex: 1, minWidth: 0 },
});
