import { useState, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { ApiError } from '@/lib/api/client';
import { describeError } from '@/lib/api/describe-error';
import { Spacing } from '@/lib/theme';
import { Button } from '../ui/button';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';

export type PlanJsonFormProps = {
  label: string;
  initial: string;
  submitLabel: string;
  /** Ask for the reason of the change (edits); an import needs none. */
  withReason?: boolean;
  pending: boolean;
  error: unknown;
  done?: string | null;
  /** More fields between the JSON and the button (a proposal's source and rationale). */
  extra?: ReactNode;
  onSubmit: (value: unknown, reason: string) => void;
};

/**
 * The plan file format (DEVELOPERS.md, "Test plans") edited as JSON text: checked as JSON
 * here, then by the server's own schema and graph rules, whose problems are listed by their
 * JSON path ('steps.3.next.fail.step').
 */
export function PlanJsonForm({
  label,
  initial,
  submitLabel,
  withReason,
  pending,
  error,
  done,
  extra,
  onSubmit,
}: PlanJsonFormProps) {
  const [text, setText] = useState(initial);
  const [reason, setReason] = useState('');
  const [parseError, setParseError] = useState<string | null>(null);
  const submit = () => {
    try {
      const value: unknown = JSON.parse(text);
      setParseError(null);
      onSubmit(value, reason.trim());
    } catch (e) {
      setParseError(`Not valid JSON: ${(e as Error).message}`);
    }
  };
  const problems = error instanceof ApiError ? error.errors : [];
  return (
    <View style={styles.form} testID="plan-json-form">
      <TextField
        label={label}
        value={text}
        onChangeText={setText}
        multiline
        numberOfLines={18}
        style={styles.code}
        autoCapitalize="none"
        autoCorrect={false}
        testID="plan-json"
      />
      {extra}
      {withReason ? (
        <TextField label="Reason for the change" value={reason} onChangeText={setReason} testID="plan-reason" />
      ) : null}
      {parseError ? (
        <Text color="fail" accessibilityRole="alert">
          {parseError}
        </Text>
      ) : null}
      {error ? (
        <View accessibilityRole="alert" testID="plan-json-errors">
          <Text color="fail">{describeError(error)}</Text>
          {problems.map((p) => (
            <Text key={`${p.path}:${p.message}`} variant="small" color="fail">
              {p.path}: {p.message}
            </Text>
          ))}
        </View>
      ) : null}
      {done ? <Text testID="plan-json-done">{done}</Text> : null}
      <Button
        label={pending ? 'Sending…' : submitLabel}
        disabled={pending || (withReason && reason.trim() === '')}
        onPress={submit}
        testID="plan-json-submit"
      />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: Spacing.md },
  code: { minHeight: 320, fontFamily: 'monospace', fontSize: 13 },
});
