import { StyleSheet } from 'react-native';
import { Spacing } from '@/lib/theme';
import { useController, type Control, type Path } from 'react-hook-form';
import type { TextFieldProps } from '../ui/text-field';
import { ChoiceRow } from '../ui/choice-row';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import type { EditableField, SpecField } from '@/lib/contracts/spec-fields';
import type { SpecFormValues } from './spec-form-values';

/** Any resolver output: the fields only read and write the typed text. */

export type SpecControl = Control<SpecFormValues, any, any>;
/** The shared schema names a few fields as the API does (yearFrom); the form says them in words. */
const WORDS: Record<string, string> = { yearFrom: 'Year from', yearTo: 'Year to', refTempC: 'Reference temperature' };
const plain = (message: string | undefined) =>
  message
    ?.replace(/^(yearFrom|yearTo|refTempC)\b/, (w) => WORDS[w])
    .replace(/\b(yearFrom|yearTo)\b/g, (w) => WORDS[w].toLowerCase());

/** The fields chosen from a list: the list's enums and the unit. */
type ChoiceName = Extract<SpecField, { kind: 'enum' | 'unit'; key: EditableField }>['key'];
type TextName = Exclude<Path<SpecFormValues>, 'source' | ChoiceName>;

export type FormFieldProps = Omit<TextFieldProps, 'value' | 'onChangeText'> & { control: SpecControl; name: TextName };

/** A TextField bound to one form value, with the field's error under it. */
export function FormField({ control, name, style, ...rest }: FormFieldProps) {
  const { field, fieldState } = useController({ control, name });
  return (
    <TextField
      value={field.value}
      onChangeText={field.onChange}
      onBlur={field.onBlur}
      error={plain(fieldState.error?.message)}
      testID={`spec-form-${name}`}
      style={[rest.multiline && styles.multiline, style]}
      {...rest}
    />
  );
}

export type FormChoiceProps = {
  control: SpecControl;
  name: ChoiceName;
  label: string;
  options: { value: string; label: string }[];
};

/** A ChoiceRow bound to one form value (unit, material, status). */
export function FormChoice({ control, name, label, options }: FormChoiceProps) {
  const { field, fieldState } = useController({ control, name });
  return (
    <>
      <ChoiceRow label={label} options={options} value={field.value} onChange={field.onChange} />
      {fieldState.error ? (
        <Text variant="small" color="fail" accessibilityRole="alert">
          {fieldState.error.message}
        </Text>
      ) : null}
    </>
  );
}

const styles = StyleSheet.create({
  // Room above and below the text of a multi-line field, which otherwise sits on the border.
  multiline: { paddingVertical: Spacing.sm, minHeight: 72, textAlignVertical: 'top' },
});
