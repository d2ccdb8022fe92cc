import { StyleSheet, View } from 'react-native';
import { unitsOfKind, type CanonicalUnit, type QuantityKind } from '@/lib/units';
import { Spacing } from '@/lib/theme';
import { Card } from '../ui/card';
import { ChoiceRow } from '../ui/choice-row';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { UnitPicker } from './unit-picker';

export type TypedLimits = { min: string; nominal: string; max: string; refTempC: string; engineRpm: string };

export type LimitsFormProps = {
  kind: QuantityKind;
  limits: TypedLimits;
  onChangeLimits: (l: TypedLimits) => void;
  unit: CanonicalUnit;
  onChangeUnit: (u: CanonicalUnit) => void;
  copper: boolean;
  /** Absent: the part is not a winding, so no choice is offered. */
  onChangeCopper?: (c: boolean) => void;
  /** Charging checks are read at a stated engine speed. */
  showEngineRpm?: boolean;
};

const LABELS = { min: 'Minimum', nominal: 'Nominal', max: 'Maximum' } as const;

/** Spec limits typed from the technician's own manual, for the standalone calculator. */
export function LimitsForm({
  kind,
  limits,
  onChangeLimits,
  unit,
  onChangeUnit,
  copper,
  onChangeCopper,
  showEngineRpm,
}: LimitsFormProps) {
  return (
    <Card testID="limits-form">
      <Text variant="heading">Spec limits</Text>
      <View style={styles.row}>
        {(['min', 'nominal', 'max'] as const).map((k) => (
          <View key={k} style={styles.cell}>
            <TextField
              label={LABELS[k]}
              value={limits[k]}
              inputMode="decimal"
              keyboardType="decimal-pad"
              onChangeText={(v) => onChangeLimits({ ...limits, [k]: v })}
              testID={`limit-${k}`}
            />
          </View>
        ))}
      </View>
      <UnitPicker label="Spec unit" units={unitsOfKind(kind)} value={unit} onChange={onChangeUnit} />
      {showEngineRpm ? (
        <TextField
          label="Engine speed, rpm (optional)"
          value={limits.engineRpm}
          inputMode="numeric"
          onChangeText={(v) => onChangeLimits({ ...limits, engineRpm: v })}
          testID="limit-engine-rpm"
        />
      ) : null}
      {kind === 'resistance' && onChangeCopper ? (
        <>
          <ChoiceRow
            label="Winding"
            options={[
              { value: true, label: 'Copper winding' },
              { value: false, label: 'Not a winding' },
            ]}
            value={copper}
            onChange={onChangeCopper}
          />
          {copper ? (
            <TextField
              label="Reference temperature °C (default 20)"
              value={limits.refTempC}
              inputMode="decimal"
              onChangeText={(v) => onChangeLimits({ ...limits, refTempC: v })}
            />
          ) : null}
        </>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: Spacing.sm, flexWrap: 'wrap' },
  cell: { flex: 1, minWidth: 90 },
});
