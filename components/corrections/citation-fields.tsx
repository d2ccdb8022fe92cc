import { StyleSheet, View } from 'react-native';
import type { Control, FieldPath } from 'react-hook-form';
import { Spacing } from '@/lib/theme';
import { FormField } from '../ui/form-field';
import { Text } from '../ui/text';

/** The typed source and reason every proposal carries (the body's `citation` and `rationale`). */
export type CitationValues = { title: string; edition: string; page: string; url: string; rationale: string };

export type CitationFieldsProps<V extends CitationValues> = {
  /** Any resolver output: the fields only read and write text. */
  control: Control<V, any, any>;
  /** The rationale field's label: what the proposal changes. */
  rationaleLabel?: string;
};

/** A proposal's source (required) and why: shared by the spec and test-plan proposal forms. */
export function CitationFields<V extends CitationValues>({
  control,
  rationaleLabel = 'Why should it change?',
}: CitationFieldsProps<V>) {
  const field = (name: keyof CitationValues, label: string, extra: object = {}) => (
    <FormField control={control} name={name as FieldPath<V>} label={label} testID={`proposal-${name}`} {...extra} />
  );
  return (
    <>
      <Text variant="heading">Source (required)</Text>
      {field('title', 'Source title')}
      <View style={styles.row}>
        <View style={styles.cell}>{field('edition', 'Edition')}</View>
        <View style={styles.cell}>{field('page', 'Page')}</View>
      </View>
      {field('url', 'Link (optional)', { inputMode: 'url', autoCapitalize: 'none' })}
      {field('rationale', rationaleLabel, { multiline: true, numberOfLines: 3 })}
    </>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: Spacing.sm, flexWrap: 'wrap' },
  cell: { flex: 1, minWidth: 100 },
});
