import { StyleSheet, View } from 'react-native';
import { CANONICAL_UNITS } from '@/lib/units';
import { MEASUREMENT_MODE_LABEL } from '@/lib/contracts/enums';
import { fieldsWith, type FieldRule } from '@/lib/contracts/spec-fields';
import { Spacing } from '@/lib/theme';
import { Text } from '../ui/text';
import { FormChoice, FormField, type SpecControl } from './form-field';
import { capitalised } from '@/lib/format/capitalised';

const UNITS = CANONICAL_UNITS.map((u) => ({ value: u, label: u }));
const decimal = { inputMode: 'decimal', keyboardType: 'decimal-pad' } as const;
/** Words for enum values the list names by code. */
const VALUE_WORDS: Readonly<Record<string, string>> = { ...MEASUREMENT_MODE_LABEL };

type Field = ReturnType<typeof fieldsWith<'editable'>>[number];
const FIELDS = fieldsWith('editable');

export type SpecValueFieldsProps = { control: SpecControl; materialAuto?: boolean };

function Input({ f, control, materialAuto }: SpecValueFieldsProps & { f: Field }) {
  const label = f.input.label ?? f.label;
  if (f.kind === 'unit') return <FormChoice control={control} name="unit" label={label} options={UNITS} />;
  if (f.kind === 'enum') {
    const empty = f.input.choices?.[''];
    const offerEmpty = empty !== undefined && (f.nullable || materialAuto);
    const options = [
      ...(offerEmpty ? [{ value: '', label: empty }] : []),
      ...((f.rule as FieldRule).values ?? []).map((v) => ({ value: v, label: VALUE_WORDS[v] ?? capitalised(v) })),
    ];
    return <FormChoice control={control} name={f.key} label={label} options={options} />;
  }
  if (f.kind === 'number') return <FormField control={control} name={f.key} label={label} {...decimal} />;
  return <FormField control={control} name={f.key} label={label} multiline={(f.rule as FieldRule).multiline} />;
}

/** Consecutive fields of one input group share a row (the limits). */
function rows(fields: readonly Field[]): Field[][] {
  const out: Field[][] = [];
  for (const f of fields) {
    const last = out[out.length - 1];
    if (f.input.group && last?.[0].input.group === f.input.group) last.push(f);
    else out.push([f]);
  }
  return out;
}

/** The values of a spec an editor sets, shared by the create and edit forms: one input per editable field of the list. */
export function SpecValueFields({ control, materialAuto }: SpecValueFieldsProps) {
  const show = (fields: readonly Field[]) =>
    rows(fields).map((row) =>
      row.length === 1 ? (
        <Input key={row[0].key} f={row[0]} control={control} materialAuto={materialAuto} />
      ) : (
        <View key={row[0].key} style={styles.row}>
          {row.map((f) => (
            <View key={f.key} style={styles.cell}>
              <Input f={f} control={control} materialAuto={materialAuto} />
            </View>
          ))}
        </View>
      ),
    );
  return (
    <>
      {show(FIELDS.filter((f) => !f.input.last))}
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
      {show(FIELDS.filter((f) => f.input.last))}
    </>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: Spacing.sm, flexWrap: 'wrap' },
  cell: { flex: 1, minWidth: 100 },
});
