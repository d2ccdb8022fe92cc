import { StyleSheet, View } from 'react-native';
import { Radius, Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Text } from './text';

export type CautionProps = { title: string; lines: string[]; testID?: string };

/** A safety caution: never colour alone, always the word "Caution" and the reasons. */
export function Caution({ title, lines, testID }: CautionProps) {
  const t = useTheme();
  return (
    <View
      testID={testID}
      accessibilityRole="alert"
      style={[styles.box, { backgroundColor: t.cautionSurface, borderColor: t.cautionBorder }]}
    >
      <Text variant="label" color="caution">
        Caution: {title}
      </Text>
      {lines.map((line) => (
        <Text key={line} variant="small" color="text">
          • {line}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 1, borderLeftWidth: 6, borderRadius: Radius.md, padding: Spacing.md, gap: Spacing.xs },
});
