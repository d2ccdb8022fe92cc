import { StyleSheet, View } from 'react-native';
import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { ComponentSpecs } from '@/components/library/component-specs';
import { modelTitle } from '@/lib/format/model-title';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/states';
import { describeError } from '@/lib/api/describe-error';
import { useModelQuery } from '@/lib/hooks/use-library';
import { Spacing } from '@/lib/theme';
import { useIsWide } from '@/lib/theme/use-theme';

export default function ModelSheetScreen() {
  const { modelId } = useLocalSearchParams<{ modelId: string }>();
  const router = useRouter();
  const wide = useIsWide();
  const model = useModelQuery(Number(modelId));

  if (model.isPending)
    return (
      <Screen>
        <LoadingState label="Loading the model sheet" />
      </Screen>
    );
  if (model.error)
    return (
      <Screen>
        <ErrorState message={describeError(model.error)} onRetry={model.refetch} />
      </Screen>
    );
  const m = model.data;
  return (
    <Screen testID="model-screen">
      <Stack.Screen options={{ title: `${m.make.name} ${m.name}` }} />
      <View style={styles.intro}>
        <Text variant="title">{modelTitle(m)}</Text>
        <Text color="textMuted">
          {m.componentCount} components · {m.specCount} specs
        </Text>
      </View>
      {m.components.length === 0 ? (
        <EmptyState message="No specs for this model yet." />
      ) : (
        <View style={[styles.grid, wide && styles.gridWide]}>
          {m.components.map((c) => (
            <View key={c.id} style={wide ? styles.cellWide : undefined}>
              <ComponentSpecs component={c} onOpenSpec={(id) => router.push(`/specs/${id}`)} />
            </View>
          ))}
        </View>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  intro: { gap: Spacing.xs },
  grid: { gap: Spacing.md },
  gridWide: { flexDirection: 'row', flexWrap: 'wrap' },
  cellWide: { width: '49%', flexGrow: 1 },
});
