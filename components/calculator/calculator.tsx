import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { calculate, correctionsFor, countHint, LEAD_UNIT, type CalculatorForm } from '@/lib/calculator/form';
import { unitsOfKind, type CanonicalUnit, type QuantityKind } from '@/lib/units';
import { modeForKind, modeInstruction, type SpecLimits, type VerdictInput, type VerdictResult } from '@/lib/verdict';
import { Spacing } from '@/lib/theme';
import type { AddToJobTarget } from '@/lib/hooks/use-add-to-job';
import { AddToJob } from '../jobs/add-to-job';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { MemoryChips, type MemoryChip } from './memory-chips';
import { OptionalFields } from './optional-fields';
import { QuantityField } from './quantity-field';
import { useCalculatorForm } from './use-calculator-form';
import { VerdictPanel } from './verdict-panel';
import { VerdictSummary } from './verdict-summary';

export type CalculatorProps = {
  spec: SpecLimits;
  kind: QuantityKind;
  testID?: string;
  /** Where "Add to job" sends the reading (the spec, a job and re-take from the screen's address). */
  job?: AddToJobTarget;
  /** Instead of "Add to job": what the screen does with the reading (a test plan's step judges it). */
  action?: (reading: { input: VerdictInput | null; result: VerdictResult | null }) => ReactNode;
  /** The corrections shown from the start (a step that says to subtract the leads or the cap). */
  correctionsOpen?: boolean;
  heading?: string;
};

const RESISTANCE_UNITS = unitsOfKind('resistance');

/**
 * Meter reading in, corrected value and verdict out, recalculated as you type. The meter mode is
 * the first instruction; the verdict sits right under the reading (and stays in view while the
 * optional corrections, collapsed until asked for, are typed).
 */
export function Calculator({
  spec,
  kind,
  testID = 'calculator',
  job,
  action,
  correctionsOpen,
  heading = 'Check a reading',
}: CalculatorProps) {
  const { form, set, fromMemory, clearLead, clearMeter } = useCalculatorForm(kind, spec.unit);
  const units = unitsOfKind(kind);
  const allowed = correctionsFor(kind, spec.material);
  const mode = spec.mode ?? modeForKind(kind);
  const { input, result, errors } = calculate({ ...spec, mode }, kind, form, mode);
  const field = (name: keyof CalculatorForm, label: string, unitKey?: keyof CalculatorForm, hint?: string) => (
    <QuantityField
      label={label}
      value={form[name]}
      onChangeText={(v) => set({ [name]: v })}
      error={errors[name]}
      hint={hint}
      unit={unitKey ? (form[unitKey] as CanonicalUnit) : undefined}
      units={unitKey === 'leadUnit' ? [LEAD_UNIT] : unitKey === 'seriesUnit' ? RESISTANCE_UNITS : units}
      onChangeUnit={unitKey ? (u) => set({ [unitKey]: u }) : undefined}
      testID={`${testID}-${name}`}
    />
  );
  const chips: MemoryChip[] = [];
  if (fromMemory.lead && form.lead) chips.push({ key: 'lead', text: `Leads ${form.lead} Ω`, onClear: clearLead });
  if (fromMemory.meter)
    chips.push({
      key: 'meter',
      text: `Meter ±(${form.meterPercent || 0} % + ${form.meterCounts || 0} × ${form.meterCountValue || 0} ${form.meterUnit})`,
      onClear: clearMeter,
    });
  const optional = [allowed.leads && 'leads', allowed.series && 'resistor', allowed.temperature && 'temperature']
    .filter(Boolean)
    .concat('meter accuracy')
    .join(', ');

  return (
    <Card testID={testID}>
      <Text variant="heading">{heading}</Text>
      <Text variant="label" color="primary" testID="mode-instruction">
        {modeInstruction(mode, spec.engineRpm)}
      </Text>
      {field('reading', 'Meter reading', 'readingUnit')}
      {errors.spec ? (
        <Text color="fail" accessibilityRole="alert" testID="spec-error">
          {errors.spec}
        </Text>
      ) : null}
      {result ? <VerdictSummary result={result} /> : null}
      {!result && !errors.spec && form.reading.trim() === '' ? (
        <Text color="textMuted">Type the meter reading to see the verdict.</Text>
      ) : null}
      <MemoryChips chips={chips} />
      <OptionalFields what={optional} startOpen={correctionsOpen}>
        {allowed.leads &&
          field(
            'lead',
            'Test leads, probes shorted',
            'leadUnit',
            'In ohms, subtracted from the reading; usually 0.3–1.6 Ω',
          )}
        {allowed.series &&
          field(
            'series',
            'Series resistor (cap or suppressor)',
            'seriesUnit',
            'Subtracted when it cannot be removed without damage',
          )}
        {allowed.series && form.series.trim() !== '' && field('seriesTolerancePct', 'Series resistor tolerance ±%')}
        {allowed.temperature &&
          field(
            'temperatureC',
            'Winding temperature °C',
            undefined,
            `Corrected to ${spec.refTempC ?? 20} °C for copper`,
          )}
        <Text variant="label" color="textMuted">
          Meter accuracy ±(% of reading + counts)
        </Text>
        <View style={styles.pair}>
          <View style={styles.grow}>{field('meterPercent', '% of reading')}</View>
          <View style={styles.grow}>{field('meterCounts', 'Counts')}</View>
        </View>
        {field('meterCountValue', 'One count is worth', 'meterUnit', countHint(form.meterUnit))}
      </OptionalFields>
      {result ? <VerdictPanel result={result} /> : null}
      {action ? (
        action({ input, result })
      ) : (
        <AddToJob draft={input && { kind: 'measured', input }} verdict={result?.verdict ?? null} {...job} />
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  pair: { flexDirection: 'row', gap: Spacing.sm, flexWrap: 'wrap' },
  grow: { flex: 1, minWidth: 140 },
});
