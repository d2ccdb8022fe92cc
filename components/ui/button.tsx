import { Pressable, StyleSheet, type PressableProps } from 'react-native';
import { Radius, Spacing, Type } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { focusRing } from './focus-ring';
import { Text } from './text';

export type ButtonProps = Omit<PressableProps, 'children'> & {
  /** Visible text, also the accessible name. Required: no button without a label. */
  label: string;
  variant?: 'primary' | 'secondary' | 'quiet';
};

export function Button({ label, variant = 'primary', disabled, style, ...rest }: ButtonProps) {
  const t = useTheme();
  const colors = {
    primary: { bg: t.primary, fg: t.primaryText, border: t.primary },
    secondary: { bg: t.surface, fg: t.primary, border: t.border },
    quiet: { bg: 'transparent', fg: t.primary, border: 'transparent' },
  }[variant];
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityLabel={label}
      accessibilityState={{ disabled: !!disabled }}
      aria-disabled={!!disabled}
      disabled={disabled}
      style={(state) => [
        styles.base,
        { backgroundColor: colors.bg, borderColor: colors.border, opacity: disabled ? 0.5 : state.pressed ? 0.8 : 1 },
        typeof style === 'function' ? style(state) : style,
        focusRing(t, (state as { focused?: boolean }).focused),
      ]}
      {...rest}
    >
      <Text style={[Type.label, { color: colors.fg }]}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    minHeight: 44,
    paddingHorizontal: Spacing.lg,
    borderRadius: Radius.md,
    borderWidth: 1,
    alignItems: 'center',
    justifyContent: 'center',
  },
});
