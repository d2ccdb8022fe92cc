import { StyleSheet, View } from 'react-native';
import { useController, useForm, useFormState } from 'react-hook-form';
import { ProposeBody, type SpecProposeBody } from '@/lib/contracts/corrections';
import type { CanonicalUnit } from '@/lib/units';
import { Spacing } from '@/lib/theme';
import { useServerErrors } from '../ui/form-failure';
import { FormField } from '../ui/form-field';
import { bodyResolver } from '../ui/form-resolver';
import { SubmitButton } from '../ui/submit-button';
import { Text } from '../ui/text';
import { UnitPicker } from '../calculator/unit-picker';
import { CitationFields } from './citation-fields';
import {
  proposalField,
  proposalServerErrors,
  toProposeBody,
  type ProposalFields,
  type ProposalTarget,
} from './proposal-body';

export { toProposeBody, type ProposalFields, type ProposalTarget } from './proposal-body';

export type ProposalFormProps = {
  target: ProposalTarget;
  initial: ProposalFields;
  units: CanonicalUnit[];
  submitting: boolean;
  serverErrors?: { path: string; message: string }[];
  submitLabel: string;
  onSubmit: (body: SpecProposeBody) => void;
};

const DECIMAL = { inputMode: 'decimal', keyboardType: 'decimal-pad' } as const;

/** The correction form: proposed values, the citation (required) and why. Validated with the server's schema. */
export function ProposalForm({
  target,
  initial,
  units,
  submitting,
  serverErrors = [],
  submitLabel,
  onSubmit,
}: ProposalFormProps) {
  const { control, handleSubmit, setError } = useForm<ProposalFields, unknown, ProposeBody>({
    defaultValues: initial,
    // Sends what was typed, not the parsed form: the server runs the same schema (and its transforms) itself.
    resolver: bodyResolver(ProposeBody, (v) => toProposeBody(target, v), { field: proposalField, raw: true }),
  });
  useServerErrors(setError, proposalServerErrors(serverErrors));
  const unit = useController({ control, name: 'unit' });
  const { errors } = useFormState({ control });
  const field = (name: keyof ProposalFields, label: string, extra: object = {}) => (
    <FormField control={control} name={name} label={label} testID={`proposal-${name}`} {...extra} />
  );
  return (
    <View style={styles.form} testID="proposal-form">
      {target.kind === 'new_component' && field('component', 'Component')}
      {target.kind !== 'change' && field('parameter', 'Parameter (e.g. primary winding resistance)')}
      <View style={styles.row}>
        <View style={styles.cell}>{field('min', 'Minimum', DECIMAL)}</View>
        <View style={styles.cell}>{field('nominal', 'Nominal', DECIMAL)}</View>
        <View style={styles.cell}>{field('max', 'Maximum', DECIMAL)}</View>
      </View>
      <UnitPicker label="Unit" units={units} value={unit.field.value} onChange={unit.field.onChange} />
      {unit.fieldState.error ? (
        <Text color="fail" accessibilityRole="alert">
          {unit.fieldState.error.message}
        </Text>
      ) : null}
      {field('refTempC', 'Reference temperature °C (optional)', DECIMAL)}
      {field('testPoints', 'Test points', { multiline: true })}
      {field('conditions', 'Conditions', { multiline: true })}
      <CitationFields control={control} />
      {errors.root?.message ? (
        <Text color="fail" accessibilityRole="alert">
          {errors.root.message}
        </Text>
      ) : null}
      <SubmitButton
        label={submitLabel}
        pendingLabel="Sending…"
        pending={submitting}
        onPress={handleSubmit((body) => onSubmit(body as SpecProposeBody))}
        testID="proposal-submit"
      />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: Spacing.md, maxWidth: 640 },
  row: { flexDirection: 'row', gap: Spacing.sm, flexWrap: 'wrap' },
  cell: { flex: 1, minWidth: 100 },
});
