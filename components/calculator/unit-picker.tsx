import { Pressable, StyleSheet, View } from 'react-native';
import type { CanonicalUnit } from '@/lib/units';
import { Radius, Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Text } from '../ui/text';

export type UnitPickerProps = {
  label: string;
  units: CanonicalUnit[];
  value: CanonicalUnit;
  onChange: (u: CanonicalUnit) => void;
};

/** A segmented choice of the units that fit the quantity: large targets, no dropdown. */
export function UnitPicker({ label, units, value, onChange }: UnitPickerProps) {
  const t = useTheme();
  if (units.length < 2)
    return (
      <Text variant="label" style={styles.single}>
        {value}
      </Text>
    );
  return (
    <View accessibilityRole="radiogroup" accessibilityLabel={label} style={[styles.group, { borderColor: t.border }]}>
      {units.map((u) => {
        const selected = u === value;
        return (
          <Pressable
            key={u}
            accessibilityRole="radio"
            accessibilityLabel={`${label}: ${u}`}
            accessibilityState={{ checked: selected }}
            aria-checked={selected}
            onPress={() => onChange(u)}
            style={[styles.option, { backgroundColor: selected ? t.primary : t.surface }]}
          >
            <Text variant="label" style={{ color: selected ? t.primaryText : t.text }}>
              {u}
            </Text>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { flexDirection: 'row', borderWidth: 1, borderRadius: Radius.md, overflow: 'hidden', alignSelf: 'flex-end' },
  option: {
    minWidth: 44,
    minHeight: 48,
    paddingHorizontal: Spacing.sm,
    alignItems: 'center',
    justifyContent: 'center',
  },
  single: { minHeight: 48, textAlignVertical: 'center', paddingTop: 14 },
});
