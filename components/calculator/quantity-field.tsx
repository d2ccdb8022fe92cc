import { StyleSheet, View } from 'react-native';
import type { CanonicalUnit } from '@/lib/units';
import { Spacing } from '@/lib/theme';
import { TextField } from '../ui/text-field';
import { UnitPicker } from './unit-picker';

export type QuantityFieldProps = {
  label: string;
  value: string;
  onChangeText: (text: string) => void;
  unit?: CanonicalUnit;
  units?: CanonicalUnit[];
  onChangeUnit?: (u: CanonicalUnit) => void;
  error?: string;
  hint?: string;
  testID?: string;
};

/** A number typed on the decimal keypad with its unit picker beside it. */
export function QuantityField({
  label,
  value,
  onChangeText,
  unit,
  units,
  onChangeUnit,
  error,
  hint,
  testID,
}: QuantityFieldProps) {
  return (
    <View style={styles.row}>
      <View style={styles.input}>
        <TextField
          label={label}
          value={value}
          onChangeText={onChangeText}
          inputMode="decimal"
          keyboardType="decimal-pad"
          error={error}
          hint={hint}
          testID={testID}
        />
      </View>
      {unit && units && onChangeUnit ? (
        <View style={styles.unit}>
          <UnitPicker label={`${label} unit`} units={units} value={unit} onChange={onChangeUnit} />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: Spacing.sm },
  input: { flex: 1, minWidth: 0 },
  unit: { paddingTop: 22 },
});
