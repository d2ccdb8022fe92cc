import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { Card } from './card';
import { Text } from './text';
import { Spacing } from '@/lib/theme';

export type FormPanelProps = { title: string; intro?: string; children: ReactNode; testID?: string };

/** A titled card at most 480 px wide, centred: the frame of every account form. */
export function FormPanel({ title, intro, children, testID }: FormPanelProps) {
  return (
    <Card style={styles.panel} testID={testID}>
      <View style={styles.head}>
        <Text variant="heading" accessibilityRole="header">
          {title}
        </Text>
        {intro ? <Text color="textMuted">{intro}</Text> : null}
      </View>
      {children}
    </Card>
  );
}

const styles = StyleSheet.create({
  panel: { width: '100%', maxWidth: 480, alignSelf: 'center', gap: Spacing.lg },
  head: { gap: Spacing.xs },
});
