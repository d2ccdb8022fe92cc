import { StyleSheet, View } from 'react-native';
import { useForm } from 'react-hook-form';
import type { FieldError } from '@/lib/api/client';
import { UpdateSpecBody } from '@/lib/contracts/curation';
import { Spacing } from '@/lib/theme';
import { Button } from '../ui/button';
import { Text } from '../ui/text';
import { FormField } from './form-field';
import { bodyResolver } from './spec-resolver';
import { toUpdateBody, type SpecFormValues } from './spec-form-values';
import { SpecValueFields } from './spec-value-fields';
import { useServerErrors } from './use-server-errors';

export type SpecEditFormProps = {
  /** The values the edit starts from, and their version: only fields that differ from it are sent. */
  base: SpecFormValues;
  version: number;
  /** What the form shows at first (the base, or the editor's own values brought over after a conflict). */
  initial?: SpecFormValues;
  submitting: boolean;
  serverErrors?: FieldError[];
  onSubmit: (body: UpdateSpecBody, values: SpecFormValues) => void;
};

/** Edit one spec: the changed fields, the version they are based on and why (required). */
export function SpecEditForm({ base, version, initial, submitting, serverErrors, onSubmit }: SpecEditFormProps) {
  const { control, handleSubmit, setError, getValues, formState } = useForm<SpecFormValues, unknown, UpdateSpecBody>({
    defaultValues: initial ?? base,
    resolver: bodyResolver(UpdateSpecBody, (v) => toUpdateBody(base, v, version)),
  });
  useServerErrors(setError, serverErrors);
  const rootError = formState.errors.root?.server?.message ?? formState.errors.root?.message;
  return (
    <View style={styles.form} testID="spec-edit-form">
      <Text color="textMuted">
        {base.make} {base.model} ({base.yearFrom}–{base.yearTo || 'current'}
        {base.variant ? `, ${base.variant}` : ''}) · {base.component} · version {version}
      </Text>
      <SpecValueFields control={control} />
      <FormField control={control} name="reason" label="Why does it change? (required)" multiline />
      {rootError ? (
        <Text color="fail" accessibilityRole="alert">
          {rootError === 'change at least one field' ? 'Change at least one field before saving.' : rootError}
        </Text>
      ) : null}
      <Button
        label={submitting ? 'Saving…' : 'Save a new revision'}
        disabled={submitting}
        testID="spec-edit-submit"
        onPress={handleSubmit((body) => onSubmit(body, getValues()))}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: Spacing.md, maxWidth: 720 },
});
