import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import type { ModelSummaryDto } from '@/lib/contracts/library';
import { Radius, Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { modelTitle } from '@/lib/format/model-title';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';

export type ModelPickerProps = {
  models: ModelSummaryDto[];
  value: number | null;
  onChange: (id: number | null) => void;
  error?: string | null;
};

const SHOWN = 8;

/** A searchable list of the library's models; every word typed must appear in the title. */
export function ModelPicker({ models, value, onChange, error }: ModelPickerProps) {
  const t = useTheme();
  const [q, setQ] = useState('');
  const words = q.toLowerCase().split(/\s+/).filter(Boolean);
  const matches = models.filter((m) => words.every((w) => modelTitle(m).toLowerCase().includes(w)));
  const chosen = models.find((m) => m.id === value);
  return (
    <View style={styles.wrap} testID="model-picker">
      <TextField
        label="Find the model"
        placeholder="e.g. kestrel 900"
        value={q}
        onChangeText={setQ}
        autoCapitalize="none"
        autoCorrect={false}
        error={error}
      />
      {chosen ? <Text variant="small">Chosen: {modelTitle(chosen)}</Text> : null}
      <View accessibilityRole="radiogroup" accessibilityLabel="Model" style={styles.list}>
        {matches.slice(0, SHOWN).map((m) => {
          const selected = m.id === value;
          return (
            <Pressable
              key={m.id}
              accessibilityRole="radio"
              accessibilityState={{ checked: selected }}
              accessibilityLabel={`Model: ${modelTitle(m)}`}
              onPress={() => onChange(selected ? null : m.id)}
              style={[
                styles.option,
                { borderColor: selected ? t.primary : t.border, backgroundColor: selected ? t.primary : t.surface },
              ]}
            >
              <Text style={{ color: selected ? t.primaryText : t.text }}>{modelTitle(m)}</Text>
            </Pressable>
          );
        })}
        {matches.length === 0 ? (
          <Text color="textMuted">No model matches “{q}”. Describe the machine instead.</Text>
        ) : null}
        {matches.length > SHOWN ? (
          <Text variant="small" color="textMuted">
            {matches.length - SHOWN} more — type to narrow the list.
          </Text>
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: Spacing.sm },
  list: { gap: Spacing.xs },
  option: {
    minHeight: 44,
    borderWidth: 1,
    borderRadius: Radius.md,
    paddingHorizontal: Spacing.md,
    justifyContent: 'center',
  },
});
