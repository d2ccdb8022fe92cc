import { Linking, Pressable } from 'react-native';
import type { SpecDetailDto } from '@/lib/contracts/library';
import { sourceName } from '@/lib/format/citation';
import { Card } from '../ui/card';
import { Text } from '../ui/text';

/** Where the figure comes from: title, edition, page. */
export function Citation({ spec }: { spec: SpecDetailDto }) {
  const s = spec.source;
  return (
    <Card testID="spec-citation">
      <Text variant="heading">Source</Text>
      {s ? (
        <>
          <Text>
            {sourceName(s)}
            {s.year ? ` (${s.year})` : ''}
          </Text>
          {spec.sourcePage ? <Text color="textMuted">Page {spec.sourcePage}</Text> : null}
          {s.url ? (
            <Pressable
              accessibilityRole="link"
              accessibilityLabel="Open the source document"
              onPress={() => Linking.openURL(s.url!)}
            >
              <Text color="primary">{s.url}</Text>
            </Pressable>
          ) : null}
        </>
      ) : (
        <Text color="fail">No source cited: treat this figure with care.</Text>
      )}
    </Card>
  );
}
