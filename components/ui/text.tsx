import { Text as RNText, type TextProps as RNTextProps } from 'react-native';
import { Type, type ThemeColor } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';

export type TextProps = RNTextProps & { variant?: keyof typeof Type; color?: ThemeColor };

export function Text({ variant = 'body', color = 'text', style, ...rest }: TextProps) {
  const t = useTheme();
  return <RNText {...rest} style={[Type[variant], { color: t[color] }, style]} />;
}
