import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { parseDecimal } from '@/lib/calculator/form';
import { batteryStateOfCharge, type BatteryType } from '@/lib/verdict';
import { formatNumber } from '@/lib/units';
import { Spacing } from '@/lib/theme';
import { Card } from '../ui/card';
import { ChoiceRow } from '../ui/choice-row';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';

const TYPES: { value: BatteryType; label: string }[] = [
  { value: 'flooded', label: 'Flooded (wet)' },
  { value: 'agm', label: 'AGM' },
];

/** 12 V lead-acid rest voltage → state of charge, from the published tables, with the rest advice. */
export function BatteryCharge() {
  const [volts, setVolts] = useState('');
  const [type, setType] = useState<BatteryType>('flooded');
  const value = parseDecimal(volts);
  const soc = value !== undefined && !Number.isNaN(value) ? batteryStateOfCharge(value, type) : null;
  return (
    <Card testID="battery-charge">
      <Text variant="heading">State of charge (12 V lead-acid)</Text>
      <ChoiceRow label="Battery type" options={TYPES} value={type} onChange={setType} />
      <TextField
        label="Rest voltage, V"
        value={volts}
        onChangeText={setVolts}
        inputMode="decimal"
        keyboardType="decimal-pad"
        error={value !== undefined && Number.isNaN(value) ? 'Type a number, e.g. 12.48' : null}
        testID="battery-volts"
      />
      {soc ? (
        <View style={styles.result} testID="battery-soc">
          <Text variant="title">{`About ${formatNumber(soc.percent, 3)} % charged`}</Text>
          <Text variant="small" color="textMuted">
            {soc.note}
          </Text>
        </View>
      ) : (
        <Text variant="small" color="textMuted">
          Let the battery rest at least 6 hours (24 is better) with nothing connected before reading.
        </Text>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({ result: { gap: Spacing.xs } });
