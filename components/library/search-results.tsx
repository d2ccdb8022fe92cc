import { StyleSheet, View } from 'react-native';
import type { SearchResultDto } from '@/lib/contracts/library';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Card } from '../ui/card';
import { LinkRow } from '../ui/link-row';
import { Text } from '../ui/text';
import { modelTitle } from '@/lib/format/model-title';

export type SearchResultsProps = {
  result: SearchResultDto;
  onOpenSpec: (specId: number) => void;
  onOpenModel: (modelId: number) => void;
};

/** Hits grouped by model, each with its value inline so most look-ups need no second tap. */
export function SearchResults({ result, onOpenSpec, onOpenModel }: SearchResultsProps) {
  const t = useTheme();
  return (
    <View style={styles.list} testID="search-results">
      <Text variant="small" color="textMuted">
        {result.total === 1 ? '1 spec' : `${result.total} specs`} for “{result.query}”
      </Text>
      {result.groups.map((g) => (
        <Card key={g.model.id}>
          <LinkRow
            href={`/models/${g.model.id}`}
            accessibilityLabel={`Open model sheet ${modelTitle(g.model)}`}
            onPress={() => onOpenModel(g.model.id)}
            style={styles.heading}
          >
            <Text variant="heading" color="primary">
              {modelTitle(g.model)}
            </Text>
          </LinkRow>
          {g.hits.map((h) => (
            <LinkRow
              key={h.specId}
              testID={`hit-${h.specId}`}
              href={`/specs/${h.specId}`}
              accessibilityLabel={`${h.component}, ${h.parameter}: ${h.display}`}
              onPress={() => onOpenSpec(h.specId)}
              style={({ pressed }) => [
                styles.hit,
                { borderTopColor: t.border, backgroundColor: pressed ? t.surfaceMuted : 'transparent' },
              ]}
            >
              <View style={styles.hitText}>
                <Text variant="small" color="textMuted">
                  {h.component}
                </Text>
                <Text>{h.parameter}</Text>
              </View>
              <Text variant="label" style={styles.value}>
                {h.display}
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
  heading: { minHeight: 44, justifyContent: 'center' },
  hit: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: Spacing.md,
    paddingVertical: Spacing.sm,
    borderTopWidth: StyleSheet.hairlineWidth,
    minHeight: 48,
  },
  hitText: { flex: 1 },
  value: { fontSize: 16, textAlign: 'right' },
});
