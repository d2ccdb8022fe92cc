import type { ReactNode } from 'react';
import { Platform, Pressable, type GestureResponderEvent, type StyleProp, type ViewStyle } from 'react-native';
import { useTheme } from '@/lib/theme/use-theme';
import { focusRing } from './focus-ring';

export type LinkRowProps = {
  /** Where it goes: rendered as the anchor's href on the web (open in a new tab, copy the address). */
  href: string;
  onPress: () => void;
  accessibilityLabel: string;
  children: ReactNode;
  style?: StyleProp<ViewStyle> | ((state: { pressed: boolean }) => StyleProp<ViewStyle>);
  testID?: string;
  /** Draw the focus ring inside the row (at the window's edge). */
  focusInset?: boolean;
  /** The current page's entry in a navigation bar. */
  'aria-current'?: 'page';
};

type WebPress = GestureResponderEvent & { preventDefault?: () => void; metaKey?: boolean; ctrlKey?: boolean };

/**
 * A pressable row that is a real link: on the web an `<a href>`, so the browser opens it with Enter
 * (react-native-web leaves Enter on role="link" to the browser, which does nothing for a plain div).
 * Space opens it too, as rows in lists are often taken for buttons. Modified clicks (new tab) are left to the
 * browser; a plain press navigates in the app.
 */
export function LinkRow({
  href,
  onPress,
  accessibilityLabel,
  children,
  style,
  testID,
  focusInset,
  ...aria
}: LinkRowProps) {
  const t = useTheme();
  const web = Platform.OS === 'web';
  const press = (e?: GestureResponderEvent) => {
    const w = e as WebPress | undefined;
    if (web && (w?.metaKey || w?.ctrlKey)) return;
    w?.preventDefault?.();
    onPress();
  };
  const webProps = web
    ? {
        href,
        onKeyDown: (e: { key: string; preventDefault: () => void }) => {
          if (e.key === ' ') {
            e.preventDefault();
            onPress();
          }
        },
      }
    : {};
  return (
    <Pressable
      accessibilityRole="link"
      accessibilityLabel={accessibilityLabel}
      onPress={press}
      testID={testID}
      {...aria}
      style={(state) => [
        typeof style === 'function' ? style(state) : style,
        focusRing(t, (state as { focused?: boolean }).focused, focusInset),
      ]}
      {...webProps}
    >
      {children}
    </Pressable>
  );
}
