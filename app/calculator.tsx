import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Calculator } from '../components/calculator/calculator';
import { QualitativeCheck } from '../components/calculator/qualitative-check';
import { UnitPicker } from '../components/calculator/unit-picker';
import { SafetyNotes } from '../components/library/safety-notes';
import { Card } from '../components/ui/card';
import { ChoiceRow } from '../components/ui/choice-row';
import { Screen } from '../components/ui/screen';
import { Text } from '../components/ui/text';
import { TextField } from '../components/ui/text-field';
import { parseDecimal } from '../lib/calculator/form';
import { unitsOfKind, type CanonicalUnit, type QuantityKind } from '../lib/units';
import { Spacing } from '../lib/theme';
import { useIsWide } from '../lib/theme/use-theme';

type Mode = QuantityKind | 'diode' | 'continuity';
const MODES: Array<{ value: Mode; label: string }> = [
  { value: 'resistance', label: 'Resistance' }, { value: 'voltage', label: 'Voltage' }, { value: 'current', label: 'Current' },
  { value: 'length', label: 'Gap' }, { value: 'diode', label: 'Diode' }, { value: 'continuity', label: 'Continuity' },
];

/** For a spec that is not in the library: type the limits by hand. */
export default function StandaloneCalculatorScreen() {
  const wide = useIsWide();
  const [mode, setMode] = useState<Mode>('resistance');
  const [limits, setLimits] = useState({ min: '', nominal: '', max: '', refTempC: '' });
  const [unit, setUnit] = useState<CanonicalUnit>('Ω');
  const [copper, setCopper] = useState(true);
  const choose = (m: Mode) => {
    setMode(m);
    if (m !== 'diode' && m !== 'continuity') setUnit(unitsOfKind(m)[0]);
  };
  const num = (s: string) => { const v = parseDecimal(s); return v === undefined || Number.isNaN(v) ? undefined : v; };
  const spec = {
    min: num(limits.min), nominal: num(limits.nominal), max: num(limits.max), unit,
    refTempC: num(limits.refTempC), material: mode === 'resistance' && copper ? 'copper' as const : 'none' as const,
  };
  return (
    <Screen testID="calculator-screen">
      <Text variant="title">Calculator</Text>
      <Text color="textMuted">For a spec that is not in the library: type the limits from your manual.</Text>
      <ChoiceRow label="What are you checking?" options={MODES} value={mode} onChange={choose} />
      <View style={[styles.columns, wide && styles.columnsWide]}>
        <View style={[styles.column, wide && styles.columnWide]}>
          {mode === 'diode' || mode === 'continuity' ? <QualitativeCheck kind={mode} /> : (
            <Card testID="limits-form">
              <Text variant="heading">Spec limits</Text>
              <View style={styles.row}>
                {(['min', 'nominal', 'max'] as const).map((k) => (
                  <View key={k} style={styles.cell}>
                    <TextField label={{ min: 'Minimum', nominal: 'Nominal', max: 'Maximum' }[k]} value={limits[k]} inputMode="decimal" keyboardType="decimal-pad"
                      onChangeText={(v) => setLimits({ ...limits, [k]: v })} testID={`limit-${k}`} />
                  </View>
                ))}
              </View>
              <UnitPicker label="Spec unit" units={unitsOfKind(mode)} value={unit} onChange={setUnit} />
              {mode === 'resistance' ? (
                <>
                  <ChoiceRow label="Winding" options={[{ value: true, label: 'Copper winding' }, { value: false, label: 'Not a winding' }]} value={copper} onChange={setCopper} />
                  {copper ? <TextField label="Reference temperature °C (default 20)" value={limits.refTempC} inputMode="decimal" onChangeText={(v) => setLimits({ ...limits, refTempC: v })} /> : null}
                </>
              ) : null}
            </Card>
          )}
          <SafetyNotes component={mode === 'voltage' ? 'charging battery' : 'ignition'} parameter="" />
        </View>
        <View style={[styles.column, wide && styles.columnWide]}>
          {mode !== 'diode' && mode !== 'continuity' ? <Calculator spec={spec} kind={mode} testID="standalone-calculator" /> : null}
        </View>
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  columns: { gap: Spacing.lg },
  columnsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  column: { gap: Spacing.lg, minWidth: 0 },
  // Side by side the columns share the width; stacked on a phone each takes its own height.
  columnWide: { flex: 1 },
  row: { flexDirection: 'row', gap: Spacing.sm, flexWrap: 'wrap' },
  cell: { flex: 1, minWidth: 90 },
});
