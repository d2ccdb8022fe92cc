import { StyleSheet, View } from 'react-native';
import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { SystemSection } from '@/components/plans/system-section';
import { modelTitle } from '@/lib/format/model-title';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/states';
import { describeError } from '@/lib/api/describe-error';
import { useModelQuery } from '@/lib/hooks/use-library';
import { usePlansQuery } from '@/lib/hooks/use-plans';
import { groupBySystem } from '@/lib/specs/systems';
import { Spacing } from '@/lib/theme';
import { useIsWide } from '@/lib/theme/use-theme';

export default function ModelSheetScreen() {
  const { modelId } = useLocalSearchParams<{ modelId: string }>();
  const router = useRouter();
  const wide = useIsWide();
  const model = useModelQuery(Number(modelId));
  const plans = usePlansQuery({ modelId: Number(modelId) }, Number(modelId) > 0);

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
        groupBySystem(m.components).map((g) => (
          <SystemSection
            key={g.system}
            system={g.system}
            components={g.components}
            plans={(plans.data ?? []).filter((p) => p.system === g.system)}
            wide={wide}
            onOpenSpec={(id) => router.push(`/specs/${id}`)}
            onOpenPlan={(p) => router.push(`/plans/${p.id}?modelId=${m.id}`)}
          />
        ))
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  intro: { gap: Spacing.xs },
});
