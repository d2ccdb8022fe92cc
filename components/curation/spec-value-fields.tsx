import { StyleSheet, View } from 'react-native';
import { CANONICAL_UNITS } from '@/lib/units';
import { Spacing } from '@/lib/theme';
import { Text } from '../ui/text';
import { FormChoice, FormField, type SpecControl } from './form-field';

const UNITS = CANONICAL_UNITS.map((u) => ({ value: u, label: u }));
const decimal = { inputMode: 'decimal', keyboardType: 'decimal-pad' } as const;

export type SpecValueFieldsProps = { control: SpecControl; materialAuto?: boolean };

/** The values of a spec an editor sets, shared by the create and edit forms. */
export function SpecValueFields({ control, materialAuto }: SpecValueFieldsProps) {
  const materials = [
    ...(materialAuto ? [{ value: '', label: 'From the parameter' }] : []),
    { value: 'copper', label: 'Copper' },
    { value: 'none', label: 'None' },
  ];
  return (
    <>
      <FormField control={control} name="parameter" label="Parameter (e.g. primary winding resistance)" />
      <View style={styles.row}>
        <View style={styles.cell}>
          <FormField control={control} name="min" label="Minimum" {...decimal} />
        </View>
        <View style={styles.cell}>
          <FormField control={control} name="nominal" label="Nominal" {...decimal} />
        </View>
        <View style={styles.cell}>
          <FormField control={control} name="max" label="Maximum" {...decimal} />
        </View>
      </View>
      <FormChoice control={control} name="unit" label="Unit" options={UNITS} />
      <FormField control={control} name="refTempC" label="Reference temperature °C (optional)" {...decimal} />
      <FormChoice control={control} name="material" label="Winding material" options={materials} />
      <FormField control={control} name="testPoints" label="Test points" multiline />
      <FormField control={control} name="conditions" label="Conditions" multiline />
      <FormField control={control} name="notes" label="Notes" multiline />
      <Text variant="heading">Source (required)</Text>
      <FormField control={control} name="source.title" label="Source title" />
      <View style={styles.row}>
        <View style={styles.cell}>
          <FormField control={control} name="source.edition" label="Edition" />
        </View>
        <View style={styles.cell}>
          <FormField control={control} name="source.page" label="Page" />
        </View>
      </View>
      <FormField control={control} name="source.url" label="Link (optional)" inputMode="url" autoCapitalize="none" />
      <FormChoice
        control={control}
        name="status"
        label="Status"
        options={[
          { value: 'published', label: 'Published' },
          { value: 'draft', label: 'Draft' },
        ]}
      />
    </>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: Spacing.sm, flexWrap: 'wrap' },
  cell: { flex: 1, minWidth: 100 },
});
