import type { ReactNode } from 'react';
import { StyleSheet, View, type ViewProps } from 'react-native';
import { Radius, Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';

export type CardProps = ViewProps & { children: ReactNode };

export function Card({ children, style, ...rest }: CardProps) {
  const t = useTheme();
  return (
    <View {...rest} style={[styles.card, { backgroundColor: t.surface, borderColor: t.border }, style]}>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  card: { borderWidth: 1, borderRadius: Radius.lg, padding: Spacing.lg, gap: Spacing.sm },
});
