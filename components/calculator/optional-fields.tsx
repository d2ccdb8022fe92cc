import { useState, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { Spacing } from '@/lib/theme';
import { Button } from '../ui/button';

/** Optional corrections, collapsed until asked for so the reading and its verdict share the screen. */
export function OptionalFields({
  what,
  children,
  startOpen,
}: {
  what: string;
  children: ReactNode;
  startOpen?: boolean;
}) {
  const [open, setOpen] = useState(!!startOpen);
  return (
    <View style={styles.wrap} testID="optional-fields">
      <Button
        label={open ? `Hide ${what}` : `Add ${what}`}
        variant="quiet"
        onPress={() => setOpen(!open)}
        accessibilityState={{ expanded: open }}
        testID="optional-toggle"
      />
      {open ? <View style={styles.body}>{children}</View> : null}
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: Spacing.sm }, body: { gap: Spacing.md } });
