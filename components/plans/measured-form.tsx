import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { RunStepDto, StepReading, TypedLimits } from '@/lib/contracts/plans';
import { parseDecimal } from '@/lib/calculator/form';
import { stepLimits, planLimits, toStepReading, typedSpec } from '@/lib/plans/step-reading';
import { QUANTITY_KINDS } from '@/lib/contracts/enums';
import { isCanonicalUnit, unitKind, unitsOfKind, type CanonicalUnit, type QuantityKind } from '@/lib/units';
import { Spacing } from '@/lib/theme';
import { Calculator } from '../calculator/calculator';
import { QuantityField } from '../calculator/quantity-field';
import { UnitPicker } from '../calculator/unit-picker';
import { Button } from '../ui/button';
import { Text } from '../ui/text';

export type MeasuredFormProps = { step: RunStepDto; pending: boolean; onSubmit: (reading: StepReading) => void };

/**
 * A measured step: the app's own calculator (the verdict as you type, leads, resistor cap,
 * temperature and meter accuracy, the remembered test leads), set to the library spec on
 * this machine or the plan's limits; when there are neither, the manual's limits typed
 * first. "Judge this step" sends what the calculator holds; the server judges it again.
 */
export function MeasuredForm({ step, pending, onSubmit }: MeasuredFormProps) {
  const known = stepLimits(step);
  const [typed, setTyped] = useState({ min: '', max: '' });
  const [unit, setUnit] = useState<CanonicalUnit>(guessUnit(step));
  const byHand: TypedLimits | undefined = known
    ? undefined
    : { min: parseDecimal(typed.min), max: parseDecimal(typed.max), unit };
  const typedOk =
    byHand !== undefined &&
    (byHand.min !== undefined || byHand.max !== undefined) &&
    !Number.isNaN(byHand.min) &&
    !Number.isNaN(byHand.max);
  const limits = known ?? (typedOk ? { spec: typedSpec(byHand) } : null);
  const kind: QuantityKind = known?.kind ?? unitKind(unit);

  return (
    <View style={styles.form} testID="measured-form">
      <Text variant="label" testID="step-limits">
        {known?.from === 'library' && step.spec
          ? `Limits: ${step.spec.display}`
          : known?.from === 'plan'
            ? `Limits (plan): ${planLimits(step)?.min ?? '–'} … ${planLimits(step)?.max ?? '–'} ${planLimits(step)?.unit}`
            : 'No spec for this machine: type the limits from the manual.'}
      </Text>
      {known ? null : (
        <>
          <UnitPicker label="Spec unit" units={ALL_UNITS} value={unit} onChange={setUnit} />
          <QuantityField
            label="Minimum"
            value={typed.min}
            onChangeText={(v) => setTyped({ ...typed, min: v })}
            error={Number.isNaN(byHand?.min) ? NOT_A_NUMBER : undefined}
            unit={unit}
            testID="limit-min"
          />
          <QuantityField
            label="Maximum"
            value={typed.max}
            onChangeText={(v) => setTyped({ ...typed, max: v })}
            error={Number.isNaN(byHand?.max) ? NOT_A_NUMBER : undefined}
            unit={unit}
            testID="limit-max"
          />
        </>
      )}
      {limits ? (
        <Calculator
          key={`${step.id}-${limits.spec.unit}`}
          spec={limits.spec}
          kind={kind}
          heading="Reading for this step"
          testID="step-calculator"
          correctionsOpen={kind === 'resistance'}
          action={({ input, result }) => (
            <Button
              label={
                pending ? 'Judging…' : result ? `Judge this step (${result.verdict.toUpperCase()})` : 'Judge this step'
              }
              onPress={() => input && onSubmit(toStepReading(input, byHand))}
              disabled={pending || !input || !result}
              testID="step-submit"
            />
          )}
        />
      ) : (
        <Text color="textMuted">Type at least one limit from the manual, then the reading.</Text>
      )}
    </View>
  );
}

const NOT_A_NUMBER = 'Type a number, e.g. 0.4 or 12.5';
const ALL_UNITS = QUANTITY_KINDS.flatMap((k) => unitsOfKind(k));

/** The unit a step with no limits most likely reads in: the plan's, else volts. */
function guessUnit(step: RunStepDto): CanonicalUnit {
  const u = step.spec?.unit ?? planLimits(step)?.unit;
  return u && isCanonicalUnit(u) ? u : 'V';
}

const styles = StyleSheet.create({ form: { gap: Spacing.md } });
