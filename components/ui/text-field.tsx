import { useId, useState } from 'react';
import { StyleSheet, TextInput, View, type TextInputProps } from 'react-native';
import { Radius, Spacing, Type } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Text } from './text';

export type TextFieldProps = TextInputProps & {
  /** Visible label, also the accessible name. Required: no input without a label. */
  label: string;
  hideLabel?: boolean;
  error?: string | null;
  hint?: string;
};

/**
 * A labelled text input. The hint or the error under it is tied to the input
 * (aria-describedby), so a screen reader reads it with the field; a new error is also announced.
 */
export function TextField({ label, hideLabel, error, hint, style, onFocus, onBlur, ...rest }: TextFieldProps) {
  const t = useTheme();
  const [focused, setFocused] = useState(false);
  const id = useId();
  const note = error ? `${id}-error` : hint ? `${id}-hint` : undefined;
  return (
    <View style={styles.wrap}>
      {!hideLabel && (
        <Text variant="label" color="textMuted">
          {label}
        </Text>
      )}
      <TextInput
        accessibilityLabel={label}
        aria-label={label}
        aria-invalid={!!error}
        aria-describedby={note}
        placeholderTextColor={t.textMuted}
        style={[
          styles.input,
          { color: t.text, backgroundColor: t.surface, borderColor: error ? t.fail : focused ? t.focus : t.border },
          focused && styles.focused,
          style,
        ]}
        onFocus={(e) => {
          setFocused(true);
          onFocus?.(e);
        }}
        onBlur={(e) => {
          setFocused(false);
          onBlur?.(e);
        }}
        {...rest}
      />
      {hint && !error ? (
        <Text variant="small" color="textMuted" nativeID={`${id}-hint`}>
          {hint}
        </Text>
      ) : null}
      {error ? (
        <Text variant="small" color="fail" accessibilityRole="alert" nativeID={`${id}-error`}>
          {error}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: Spacing.xs },
  input: {
    ...Type.body,
    minHeight: 48,
    paddingHorizontal: Spacing.md,
    borderWidth: 1,
    borderRadius: Radius.md,
  },
  // The theme's focus ring replaces the browser's default outline.
  focused: { borderWidth: 2, outlineStyle: 'none' } as object,
});
