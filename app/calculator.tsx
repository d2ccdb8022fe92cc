import { useState } from 'react';
import { useLocalSearchParams } from 'expo-router';
import { BatteryCharge } from '@/components/calculator/battery-charge';
import { Calculator } from '@/components/calculator/calculator';
import { LimitsForm } from '@/components/calculator/limits-form';
import { QualitativeCheck } from '@/components/calculator/qualitative-check';
import { SafetyNotes } from '@/components/library/safety-notes';
import { cautionCategoriesForMode } from '@/lib/specs/classify';
import { ChoiceRow } from '@/components/ui/choice-row';
import { Screen } from '@/components/ui/screen';
import { TwoColumns } from '@/components/ui/two-columns';
import { Text } from '@/components/ui/text';
import { parseDecimal } from '@/lib/calculator/form';
import { jobLink } from '@/lib/hooks/use-add-to-job';
import { unitsOfKind, type CanonicalUnit, type QuantityKind } from '@/lib/units';

type Mode = QuantityKind | 'diode' | 'continuity';
const MODES: { value: Mode; label: string }[] = [
  { value: 'resistance', label: 'Resistance' },
  { value: 'voltage', label: 'Voltage' },
  { value: 'current', label: 'Current' },
  { value: 'length', label: 'Gap' },
  { value: 'diode', label: 'Diode' },
  { value: 'continuity', label: 'Continuity' },
];

/** For a spec that is not in the library: type the limits by hand. */
export default function StandaloneCalculatorScreen() {
  const link = useLocalSearchParams<{ job?: string; retake?: string }>();
  const [mode, setMode] = useState<Mode>('resistance');
  const [limits, setLimits] = useState({ min: '', nominal: '', max: '', refTempC: '' });
  const [unit, setUnit] = useState<CanonicalUnit>('Ω');
  const [copper, setCopper] = useState(true);
  const choose = (m: Mode) => {
    setMode(m);
    if (m !== 'diode' && m !== 'continuity') setUnit(unitsOfKind(m)[0]);
  };
  const num = (s: string) => {
    const v = parseDecimal(s);
    return v === undefined || Number.isNaN(v) ? undefined : v;
  };
  const spec = {
    min: num(limits.min),
    nominal: num(limits.nominal),
    max: num(limits.max),
    unit,
    refTempC: num(limits.refTempC),
    material: mode === 'resistance' && copper ? ('copper' as const) : ('none' as const),
  };
  return (
    <Screen testID="calculator-screen">
      <Text variant="title">Calculator</Text>
      <Text color="textMuted">For a spec that is not in the library: type the limits from your manual.</Text>
      <ChoiceRow label="What are you checking?" options={MODES} value={mode} onChange={choose} />
      <TwoColumns
        first={
          <>
            {mode === 'diode' || mode === 'continuity' ? (
              <QualitativeCheck kind={mode} />
            ) : (
              <LimitsForm
                kind={mode}
                limits={limits}
                onChangeLimits={setLimits}
                unit={unit}
                onChangeUnit={setUnit}
                copper={copper}
                onChangeCopper={setCopper}
              />
            )}
            <SafetyNotes categories={cautionCategoriesForMode(mode)} />
            {mode === 'voltage' ? <BatteryCharge /> : null}
          </>
        }
        second={
          mode !== 'diode' && mode !== 'continuity' ? (
            <Calculator spec={spec} kind={mode} testID="standalone-calculator" job={jobLink(link)} />
          ) : null
        }
      />
    </Screen>
  );
}
