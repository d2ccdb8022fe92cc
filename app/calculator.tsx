import { useState } from 'react';
import { useLocalSearchParams } from 'expo-router';
import { BatteryCharge } from '@/components/calculator/battery-charge';
import { Calculator } from '@/components/calculator/calculator';
import { LimitsForm, type TypedLimits } from '@/components/calculator/limits-form';
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
import { MODE_KIND, type MeasurementMode } from '@/lib/verdict';

type Choice = MeasurementMode | 'gap';
const CHOICES: { value: Choice; label: string }[] = [
  { value: 'resistance', label: 'Resistance' },
  { value: 'dc_voltage', label: 'DC volts' },
  { value: 'ac_voltage', label: 'AC volts' },
  { value: 'peak_voltage', label: 'Peak volts' },
  { value: 'current', label: 'Current' },
  { value: 'gap', label: 'Gap' },
  { value: 'diode_forward', label: 'Diode' },
  { value: 'continuity', label: 'Continuity' },
];
const EMPTY: TypedLimits = { min: '', nominal: '', max: '', refTempC: '', engineRpm: '' };
// A silicon diode's forward voltage on the diode range: common practice, no published source.
const SILICON_DIODE: TypedLimits = { ...EMPTY, min: '0.4', max: '0.8' };

const kindOf = (c: Choice): QuantityKind => (c === 'gap' ? 'length' : MODE_KIND[c]);
const num = (s: string) => {
  const v = parseDecimal(s);
  return v === undefined || Number.isNaN(v) ? undefined : v;
};

/** For a spec that is not in the library: type the limits by hand. */
export default function StandaloneCalculatorScreen() {
  const link = useLocalSearchParams<{ job?: string; retake?: string }>();
  const [choice, setChoice] = useState<Choice>('resistance');
  const [limits, setLimits] = useState<TypedLimits>(EMPTY);
  const [unit, setUnit] = useState<CanonicalUnit>('Ω');
  const [copper, setCopper] = useState(true);
  const kind = kindOf(choice);
  const mode = choice === 'gap' ? null : choice;
  const choose = (c: Choice) => {
    setChoice(c);
    setUnit(unitsOfKind(kindOf(c))[0]);
    setLimits((l) => (c === 'diode_forward' ? SILICON_DIODE : choice === 'diode_forward' ? EMPTY : l));
  };
  const spec = {
    min: num(limits.min),
    nominal: num(limits.nominal),
    max: num(limits.max),
    unit,
    refTempC: num(limits.refTempC),
    material: choice === 'resistance' && copper ? ('copper' as const) : ('none' as const),
    mode,
    engineRpm: choice === 'ac_voltage' || choice === 'dc_voltage' ? num(limits.engineRpm) : undefined,
  };
  const beepOnly = choice === 'diode_forward' ? 'diode' : choice === 'continuity' ? 'continuity' : null;
  return (
    <Screen testID="calculator-screen">
      <Text variant="title">Calculator</Text>
      <Text color="textMuted">For a spec that is not in the library: type the limits from your manual.</Text>
      <ChoiceRow label="What are you checking?" options={CHOICES} value={choice} onChange={choose} />
      <TwoColumns
        first={
          <>
            <LimitsForm
              kind={kind}
              limits={limits}
              onChangeLimits={setLimits}
              unit={unit}
              onChangeUnit={setUnit}
              copper={choice === 'resistance' && copper}
              onChangeCopper={choice === 'resistance' ? setCopper : undefined}
              showEngineRpm={choice === 'ac_voltage' || choice === 'dc_voltage'}
            />
            <SafetyNotes categories={cautionCategoriesForMode(choice)} />
            {choice === 'dc_voltage' ? <BatteryCharge /> : null}
          </>
        }
        second={
          <>
            <Calculator spec={spec} kind={kind} testID="standalone-calculator" job={jobLink(link)} />
            {beepOnly ? <QualitativeCheck kind={beepOnly} job={jobLink(link)} /> : null}
          </>
        }
      />
    </Screen>
  );
}
