import { StyleSheet, View } from 'react-native';
import { useForm } from 'react-hook-form';
import type { FieldError } from '@/lib/api/client';
import { CreateSpecBody } from '@/lib/contracts/curation';
import { Spacing } from '@/lib/theme';
import { Button } from '../ui/button';
import { Text } from '../ui/text';
import { FormField } from './form-field';
import { bodyResolver } from './spec-resolver';
import { EMPTY_SPEC_FORM, toCreateBody, type SpecFormValues } from './spec-form-values';
import { SpecValueFields } from './spec-value-fields';
import { useServerErrors } from './use-server-errors';

export type SpecCreateFormProps = {
  submitting: boolean;
  serverErrors?: FieldError[];
  initial?: Partial<SpecFormValues>;
  onSubmit: (body: CreateSpecBody) => void;
};

const resolver = bodyResolver(CreateSpecBody, toCreateBody);

/** A new spec: where it belongs (make, model, years, component), its values and source. Checked with the server's schema. */
export function SpecCreateForm({ submitting, serverErrors, initial, onSubmit }: SpecCreateFormProps) {
  const { control, handleSubmit, setError, formState } = useForm<SpecFormValues, unknown, CreateSpecBody>({
    defaultValues: { ...EMPTY_SPEC_FORM, ...initial },
    resolver,
  });
  useServerErrors(setError, serverErrors);
  const rootError = formState.errors.root?.server?.message ?? formState.errors.root?.message;
  return (
    <View style={styles.form} testID="spec-create-form">
      <View style={styles.row}>
        <View style={styles.cell}>
          <FormField control={control} name="make" label="Make" />
        </View>
        <View style={styles.cell}>
          <FormField control={control} name="model" label="Model" />
        </View>
      </View>
      <View style={styles.row}>
        <View style={styles.cell}>
          <FormField control={control} name="yearFrom" label="Year from" inputMode="numeric" />
        </View>
        <View style={styles.cell}>
          <FormField control={control} name="yearTo" label="Year to (empty if current)" inputMode="numeric" />
        </View>
        <View style={styles.cell}>
          <FormField control={control} name="variant" label="Variant (optional)" />
        </View>
      </View>
      <FormField control={control} name="component" label="Component (e.g. ignition coil (rear))" />
      <SpecValueFields control={control} materialAuto />
      <FormField control={control} name="reason" label="Reason (optional)" placeholder="Created in the spec editor" />
      {rootError ? (
        <Text color="fail" accessibilityRole="alert">
          {rootError}
        </Text>
      ) : null}
      <Button
        label={submitting ? 'Creating…' : 'Create the spec'}
        onPress={handleSubmit(onSubmit)}
        disabled={submitting}
        testID="spec-create-submit"
      />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: Spacing.md, maxWidth: 720 },
  row: { flexDirection: 'row', gap: Spacing.sm, flexWrap: 'wrap' },
  cell: { flex: 1, minWidth: 140 },
});
