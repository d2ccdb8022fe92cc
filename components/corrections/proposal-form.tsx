import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { parseDecimal } from '@/lib/calculator/form';
import { ProposeBody } from '@/lib/contracts/corrections';
import type { CanonicalUnit } from '@/lib/units';
import { Spacing } from '@/lib/theme';
import { Button } from '../ui/button';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { UnitPicker } from '../calculator/unit-picker';

export type ProposalFields = {
  component: string;
  parameter: string;
  min: string;
  nominal: string;
  max: string;
  unit: CanonicalUnit;
  refTempC: string;
  testPoints: string;
  conditions: string;
  title: string;
  edition: string;
  page: string;
  url: string;
  rationale: string;
};
export type ProposalTarget =
  | { kind: 'change'; specId: number; version: number }
  | { kind: 'new_spec'; componentId: number }
  | { kind: 'new_component'; modelId: number };

export type ProposalFormProps = {
  target: ProposalTarget;
  initial: ProposalFields;
  units: CanonicalUnit[];
  submitting: boolean;
  serverErrors?: { path: string; message: string }[];
  submitLabel: string;
  onSubmit: (body: ProposeBody) => void;
};

const num = (s: string) => {
  const v = parseDecimal(s);
  return v === undefined ? null : v;
};

/** Builds the request body from the typed fields (numbers with a decimal comma are accepted). */
export function toProposeBody(target: ProposalTarget, f: ProposalFields): unknown {
  const values = {
    min: num(f.min),
    nominal: num(f.nominal),
    max: num(f.max),
    unit: f.unit,
    refTempC: num(f.refTempC),
    testPoints: f.testPoints,
    conditions: f.conditions,
  };
  const citation = { title: f.title, edition: f.edition, page: f.page, url: f.url };
  const extra =
    target.kind === 'change'
      ? {}
      : target.kind === 'new_spec'
        ? { parameter: f.parameter }
        : { component: f.component, parameter: f.parameter };
  return { ...target, ...extra, values, citation, rationale: f.rationale };
}

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
  const [f, setF] = useState(initial);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const all = { ...Object.fromEntries(serverErrors.map((e) => [e.path, e.message])), ...errors };
  const err = (...paths: string[]) => paths.map((p) => all[p]).find(Boolean);
  const field = (key: keyof ProposalFields, label: string, errorPaths: string[], extra: object = {}) => (
    <TextField
      label={label}
      value={f[key]}
      onChangeText={(v) => setF({ ...f, [key]: v })}
      error={err(...errorPaths)}
      testID={`proposal-${key}`}
      {...extra}
    />
  );
  const submit = () => {
    const body = toProposeBody(target, f);
    const parsed = ProposeBody.safeParse(body);
    if (!parsed.success) {
      setErrors(Object.fromEntries(parsed.error.issues.map((i) => [i.path.join('.'), i.message])));
      return;
    }
    setErrors({});
    // Send what was typed, not the parsed form: the server runs the same schema (and its transforms) itself.
    onSubmit(body as ProposeBody);
  };
  const decimal = { inputMode: 'decimal', keyboardType: 'decimal-pad' };
  return (
    <View style={styles.form} testID="proposal-form">
      {target.kind === 'new_component' && field('component', 'Component', ['component'])}
      {target.kind !== 'change' && field('parameter', 'Parameter (e.g. primary winding resistance)', ['parameter'])}
      <View style={styles.row}>
        <View style={styles.cell}>{field('min', 'Minimum', ['values.min'], decimal)}</View>
        <View style={styles.cell}>{field('nominal', 'Nominal', ['values.nominal'], decimal)}</View>
        <View style={styles.cell}>{field('max', 'Maximum', ['values.max'], decimal)}</View>
      </View>
      <UnitPicker label="Unit" units={units} value={f.unit} onChange={(unit) => setF({ ...f, unit })} />
      {err('values.unit') ? (
        <Text color="fail" accessibilityRole="alert">
          {err('values.unit')}
        </Text>
      ) : null}
      {field('refTempC', 'Reference temperature °C (optional)', ['values.refTempC'], decimal)}
      {field('testPoints', 'Test points', ['values.testPoints'], { multiline: true })}
      {field('conditions', 'Conditions', ['values.conditions'], { multiline: true })}
      <Text variant="heading">Source (required)</Text>
      {field('title', 'Source title', ['citation.title'])}
      <View style={styles.row}>
        <View style={styles.cell}>{field('edition', 'Edition', ['citation.edition'])}</View>
        <View style={styles.cell}>{field('page', 'Page', ['citation.page'])}</View>
      </View>
      {field('url', 'Link (optional)', ['citation.url'], { inputMode: 'url', autoCapitalize: 'none' })}
      {field('rationale', 'Why should it change?', ['rationale'], { multiline: true, numberOfLines: 3 })}
      <Button
        label={submitting ? 'Sending…' : submitLabel}
        onPress={submit}
        disabled={submitting}
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
