import { useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { calculate, correctionsFor, emptyForm, type CalculatorForm } from '@/lib/calculator/form';
import { useMeterMemory } from '@/lib/hooks/use-meter-memory';
import { unitsOfKind, type QuantityKind } from '@/lib/units';
import type { SpecLimits } from '@/lib/verdict';
import { Spacing } from '@/lib/theme';
import type { AddToJobTarget } from '@/lib/hooks/use-add-to-job';
import { AddToJob } from '../jobs/add-to-job';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { QuantityField } from './quantity-field';
import { VerdictPanel } from './verdict-panel';

/** `job`: where "Add to job" sends the reading (the spec, a job and re-take from the screen's address). */
export type CalculatorProps = { spec: SpecLimits; kind: QuantityKind; testID?: string; job?: AddToJobTarget };

/** Meter reading in, corrected value and verdict out, recalculated as you type. */
export function Calculator({ spec, kind, testID = 'calculator', job }: CalculatorProps) {
  const [form, setForm] = useState<CalculatorForm>(() => emptyForm(spec.unit));
  const [memory, remember] = useMeterMemory();
  const units = unitsOfKind(kind);
  const allowed = correctionsFor(kind, spec.material);

  useEffect(() => {
    // eslint-disable-next-line react-hooks/set-state-in-effect -- the remembered meter arrives from storage after the first render
    if (memory) setForm((f) => ({ ...f, ...memory, lead: allowed.leads ? memory.lead : '' }));
  }, [memory, allowed.leads]);
  // eslint-disable-next-line react-hooks/set-state-in-effect -- a different spec's unit resets the typed values
  useEffect(() => setForm((f) => ({ ...emptyForm(spec.unit), ...pickMeter(f) })), [spec.unit]);

  const set = (patch: Partial<CalculatorForm>) => {
    const next = { ...form, ...patch };
    setForm(next);
    if (['lead', 'meterPercent', 'meterCounts', 'meterCountValue'].some((k) => k in patch)) remember(pickMeter(next));
  };
  const { input, result, errors } = calculate(spec, kind, form);
  const field = (name: keyof CalculatorForm, label: string, unitKey?: keyof CalculatorForm, hint?: string) => (
    <QuantityField
      label={label}
      value={form[name]}
      onChangeText={(v) => set({ [name]: v })}
      error={errors[name]}
      hint={hint}
      unit={unitKey ? (form[unitKey] as CalculatorForm['readingUnit']) : undefined}
      units={unitKey ? units : undefined}
      onChangeUnit={unitKey ? (u) => set({ [unitKey]: u }) : undefined}
      testID={`${testID}-${name}`}
    />
  );

  return (
    <Card testID={testID}>
      <Text variant="heading">Check a reading</Text>
      {errors.spec ? (
        <Text color="fail" accessibilityRole="alert">
          {errors.spec}
        </Text>
      ) : null}
      {field('reading', 'Meter reading', 'readingUnit')}
      {allowed.leads &&
        field('lead', 'Test leads, probes shorted', 'leadUnit', 'Subtracted from the reading; usually 0.3–1.6 Ω')}
      {allowed.series &&
        field(
          'series',
          'Series resistor (cap or suppressor)',
          'seriesUnit',
          'Subtracted when it cannot be removed without damage',
        )}
      {allowed.series && form.series.trim() !== '' && field('seriesTolerancePct', 'Series resistor tolerance ±%')}
      {allowed.temperature &&
        field('temperatureC', 'Winding temperature °C', undefined, `Corrected to ${spec.refTempC ?? 20} °C for copper`)}
      <Text variant="label" color="textMuted">
        Meter accuracy ±(% of reading + counts) — optional
      </Text>
      <View style={styles.pair}>
        <View style={styles.grow}>{field('meterPercent', '% of reading')}</View>
        <View style={styles.grow}>{field('meterCounts', 'Counts')}</View>
      </View>
      {field('meterCountValue', 'One count is worth', 'meterUnit', 'The last digit on the range used, e.g. 0.1 Ω')}
      {result ? (
        <VerdictPanel result={result} />
      ) : (
        <Text color="textMuted">Type the meter reading to see the verdict.</Text>
      )}
      <AddToJob input={input} result={result} {...job} />
    </Card>
  );
}

function pickMeter(f: CalculatorForm) {
  return { lead: f.lead, meterPercent: f.meterPercent, meterCounts: f.meterCounts, meterCountValue: f.meterCountValue };
}

const styles = StyleSheet.create({
  pair: { flexDirection: 'row', gap: Spacing.sm, flexWrap: 'wrap' },
  grow: { flex: 1, minWidth: 140 },
});
