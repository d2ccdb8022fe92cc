import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { RunStepDto, StepReading } from '@/lib/contracts/plans';
import { parseDecimal } from '@/lib/calculator/form';
import { isCanonicalUnit, unitKind, unitsOfKind, type CanonicalUnit } from '@/lib/units';
import { Spacing } from '@/lib/theme';
import { QuantityField } from '../calculator/quantity-field';
import { Button } from '../ui/button';
import { Text } from '../ui/text';

export type MeasuredFormProps = { step: RunStepDto; pending: boolean; onSubmit: (reading: StepReading) => void };

type Typed = { reading: string; lead: string; series: string; min: string; max: string };

/** The meter reading for a measured step, pre-set to the spec's unit; typed limits when the model has no spec. */
export function MeasuredForm({ step, pending, onSubmit }: MeasuredFormProps) {
  const fallback =
    step.check.kind === 'limits' ? step.check.limits : step.check.kind === 'spec' ? step.check.limits : undefined;
  const specUnit = step.spec?.unit ?? fallback?.unit ?? 'V';
  const initial: CanonicalUnit = isCanonicalUnit(specUnit) ? specUnit : 'V';
  const [unit, setUnit] = useState<CanonicalUnit>(initial);
  const [f, setF] = useState<Typed>({ reading: '', lead: '', series: '', min: '', max: '' });
  const [error, setError] = useState<string | null>(null);
  const kind = unitKind(initial);
  const needsLimits = !step.spec && !fallback;
  const set = (patch: Partial<Typed>) => setF({ ...f, ...patch });

  const submit = () => {
    const value = parseDecimal(f.reading);
    if (value === undefined) return setError('Type the meter reading.');
    const reading: StepReading = { value, unit };
    const lead = parseDecimal(f.lead);
    const series = parseDecimal(f.series);
    if (lead !== undefined) reading.leadResistance = { value: lead, unit: 'Ω' };
    if (series !== undefined) reading.seriesResistance = { value: series, unit: 'kΩ' };
    if (needsLimits) {
      const min = parseDecimal(f.min);
      const max = parseDecimal(f.max);
      if (min === undefined && max === undefined) return setError('Type at least one limit from the manual.');
      reading.limits = { min, max, unit };
    }
    setError(null);
    onSubmit(reading);
  };

  return (
    <View style={styles.form} testID="measured-form">
      <Text variant="label" testID="step-limits">
        {step.spec
          ? `Limits: ${step.spec.display}`
          : fallback
            ? `Limits (plan): ${fallback.min ?? '–'} … ${fallback.max ?? '–'} ${fallback.unit}`
            : 'No spec for this machine: type the limits from the manual.'}
      </Text>
      {needsLimits ? (
        <>
          <QuantityField
            label="Minimum"
            value={f.min}
            onChangeText={(v) => set({ min: v })}
            unit={unit}
            testID="limit-min"
          />
          <QuantityField
            label="Maximum"
            value={f.max}
            onChangeText={(v) => set({ max: v })}
            unit={unit}
            testID="limit-max"
          />
        </>
      ) : null}
      <QuantityField
        label="Meter reading"
        value={f.reading}
        onChangeText={(v) => set({ reading: v })}
        unit={unit}
        units={unitsOfKind(kind)}
        onChangeUnit={setUnit}
        testID="step-reading"
      />
      {kind === 'resistance' ? (
        <>
          <QuantityField
            label="Test leads shorted (subtracted)"
            value={f.lead}
            onChangeText={(v) => set({ lead: v })}
            unit="Ω"
            testID="step-lead"
          />
          <QuantityField
            label="In-line resistor cap (subtracted)"
            value={f.series}
            onChangeText={(v) => set({ series: v })}
            unit="kΩ"
            hint="Leave empty when nothing is in series."
            testID="step-series"
          />
        </>
      ) : null}
      {error ? (
        <Text color="fail" accessibilityRole="alert">
          {error}
        </Text>
      ) : null}
      <Button
        label={pending ? 'Judging…' : 'Judge this reading'}
        onPress={submit}
        disabled={pending}
        testID="step-submit"
      />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: Spacing.md } });
