import { Pressable, StyleSheet, View } from 'react-native';
import { Radius, Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Text } from './text';

export type ChoiceRowProps<T> = {
  label: string;
  options: { value: T; label: string }[];
  value: T | null;
  onChange: (v: T) => void;
};

/** A labelled row of large, mutually exclusive choices. */
export function ChoiceRow<T>({ label, options, value, onChange }: ChoiceRowProps<T>) {
  const t = useTheme();
  return (
    <View style={styles.wrap}>
      <Text variant="label" color="textMuted">
        {label}
      </Text>
      <View style={styles.row} accessibilityRole="radiogroup" accessibilityLabel={label}>
        {options.map((o) => {
          const selected = o.value === value;
          return (
            <Pressable
              key={o.label}
              accessibilityRole="radio"
              accessibilityLabel={`${label}: ${o.label}`}
              accessibilityState={{ checked: selected }}
              aria-checked={selected}
              onPress={() => onChange(o.value)}
              style={[
                styles.option,
                { borderColor: selected ? t.primary : t.border, backgroundColor: selected ? t.primary : t.surface },
              ]}
            >
              <Text variant="label" style={{ color: selected ? t.primaryText : t.text }}>
                {o.label}
              </Text>
            </Pressable>
          );
        })}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: Spacing.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: Spacing.sm },
  option: {
    minHeight: 44,
    minWidth: 88,
    paddingHorizontal: Spacing.md,
    borderWidth: 1,
    borderRadius: Radius.md,
    alignItems: 'center',
    justifyContent: 'center',
  },
});
