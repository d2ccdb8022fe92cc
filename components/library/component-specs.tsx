import { StyleSheet } from 'react-native';
import type { ModelDetailDto } from '@/lib/contracts/library';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Card } from '../ui/card';
import { LinkRow } from '../ui/link-row';
import { Text } from '../ui/text';

export type ComponentSpecsProps = { component: ModelDetailDto['components'][number]; onOpenSpec: (id: number) => void };

/** One component of a model with its spec table. */
export function ComponentSpecs({ component, onOpenSpec }: ComponentSpecsProps) {
  const t = useTheme();
  return (
    <Card testID={`component-${component.id}`}>
      <Text variant="heading">{component.name}</Text>
      {component.locationNotes ? (
        <Text variant="small" color="textMuted">
          {component.locationNotes}
        </Text>
      ) : null}
      {component.specs.map((s) => (
        <LinkRow
          key={s.id}
          href={`/specs/${s.id}`}
          accessibilityLabel={`${s.parameter}: ${s.display}`}
          onPress={() => onOpenSpec(s.id)}
          style={({ pressed }) => [
            styles.row,
            { borderTopColor: t.border, backgroundColor: pressed ? t.surfaceMuted : 'transparent' },
          ]}
        >
          <Text style={styles.parameter}>{s.parameter}</Text>
          <Text variant="label" style={styles.value}>
            {s.display}
          </Text>
        </LinkRow>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: Spacing.md,
    minHeight: 44,
    borderTopWidth: StyleSheet.hairlineWidth,
  },
  parameter: { flex: 1 },
  value: { fontSize: 16 },
});
