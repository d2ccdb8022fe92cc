import { StyleSheet, View } from 'react-native';
import type { ModelSummaryDto } from '@/lib/contracts/library';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Card } from '../ui/card';
import { LinkRow } from '../ui/link-row';
import { Text } from '../ui/text';
import { modelTitle } from '@/lib/format/model-title';

export type ModelListProps = {
  models: ModelSummaryDto[];
  onOpenModel: (id: number) => void;
  /** Makes side by side (a wide screen with nothing else beside the list). */
  columns?: boolean;
};

/** Every model in the library, by make: the way in when you do not know what to type. */
export function ModelList({ models, onOpenModel, columns = false }: ModelListProps) {
  const t = useTheme();
  const makes = [...new Set(models.map((m) => m.make.name))];
  return (
    <View style={[styles.list, columns && styles.grid]} testID="model-list">
      {makes.map((make) => (
        <Card key={make} style={columns ? styles.cell : undefined}>
          <Text variant="heading">{make}</Text>
          {models
            .filter((m) => m.make.name === make)
            .map((m) => (
              <LinkRow
                key={m.id}
                href={`/models/${m.id}`}
                testID={`model-row-${m.id}`}
                accessibilityLabel={`Open model sheet ${modelTitle(m)}`}
                onPress={() => onOpenModel(m.id)}
                style={({ pressed }) => [
                  styles.row,
                  { borderTopColor: t.border, backgroundColor: pressed ? t.surfaceMuted : 'transparent' },
                ]}
              >
                <Text style={styles.name}>{modelTitle(m).slice(make.length + 1)}</Text>
                <Text variant="small" color="textMuted">
                  {m.specCount === 1 ? '1 spec' : `${m.specCount} specs`}
                </Text>
              </LinkRow>
            ))}
        </Card>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: Spacing.md },
  grid: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start' },
  cell: { flexBasis: 340, flexGrow: 1 },
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: Spacing.md,
    minHeight: 44,
    borderTopWidth: StyleSheet.hairlineWidth,
  },
  name: { flex: 1 },
});
