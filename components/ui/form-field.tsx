import { useController, type Control, type FieldPath, type FieldValues } from 'react-hook-form';
import { TextField, type TextFieldProps } from './text-field';

export type FormFieldProps<V extends FieldValues> = Omit<TextFieldProps, 'value' | 'onChangeText'> & {
  /** Any resolver output: the field only reads and writes its text. */
  control: Control<V, any, any>;
  name: FieldPath<V>;
};

/**
 * A TextField bound to one react-hook-form value, with that value's error under it (linked to
 * the input); `error` is shown when the value itself has none (a failed save, say).
 */
export function FormField<V extends FieldValues>({ control, name, onBlur, error, ...rest }: FormFieldProps<V>) {
  const { field, fieldState } = useController({ control, name });
  return (
    <TextField
      value={field.value ?? ''}
      onChangeText={field.onChange}
      onBlur={(e) => {
        field.onBlur();
        onBlur?.(e);
      }}
      error={fieldState.error?.message ?? error}
      {...rest}
    />
  );
}
