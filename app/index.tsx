import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { SearchResults } from '@/components/library/search-results';
import { ModelList } from '@/components/library/model-list';
import { PlanList } from '@/components/plans/plan-list';
import { EditorActions } from '@/components/spec-editor/editor-actions';
import { Button } from '@/components/ui/button';
import { MainAndSide } from '@/components/ui/main-and-side';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/states';
import { describeError } from '@/lib/api/describe-error';
import { useDebouncedValue } from '@/lib/hooks/use-debounced-value';
import { useModelsQuery, useSearchQuery } from '@/lib/hooks/use-library';
import { usePlansQuery } from '@/lib/hooks/use-plans';
import { useSession } from '@/lib/session/session-provider';
import { Spacing } from '@/lib/theme';
import { useIsWide } from '@/lib/theme/use-theme';

export default function SearchScreen() {
  const router = useRouter();
  const wide = useIsWide();
  const session = useSession();
  const [text, setText] = useState('');
  const q = useDebouncedValue(text, 200);
  const openSpec = (id: number) => router.push(`/specs/${id}`);
  const openModel = (id: number) => router.push(`/models/${id}`);

  return (
    <Screen testID="search-screen">
      <View style={styles.intro}>
        <Text variant="title">Find a spec</Text>
        <Text color="textMuted">
          Make, model, year, component or parameter — typos are fine. The value shows in the list.
        </Text>
      </View>
      <TextField
        label="Search specs"
        hideLabel
        placeholder="e.g. kestrel 900 primary winding"
        value={text}
        onChangeText={setText}
        autoFocus
        autoCapitalize="none"
        autoCorrect={false}
        returnKeyType="search"
        inputMode="search"
        testID="search-input"
      />
      <View style={styles.buttons}>
        <Button
          label="Calculator for limits typed by hand"
          variant="secondary"
          onPress={() => router.push('/calculator')}
          style={styles.calcButton}
        />
        <Button label="Test plans" variant="secondary" onPress={() => router.push('/plans')} testID="home-plans" />
        {session.status === 'signed-in' ? (
          <Button label="My jobs" variant="secondary" onPress={() => router.push('/jobs')} testID="home-my-jobs" />
        ) : null}
        <EditorActions />
      </View>
      {q.trim() === '' ? (
        // Nothing searched yet: the library fills the page (no empty results column beside it).
        <View style={styles.browse}>
          <Text variant="heading">Browse the library</Text>
          <BrowseModels onOpenModel={openModel} columns={wide} />
        </View>
      ) : (
        <MainAndSide
          main={<SearchArea q={q} onOpenSpec={openSpec} onOpenModel={openModel} />}
          side={
            wide && (
              <>
                <Text variant="heading">Browse the library</Text>
                <BrowseModels onOpenModel={openModel} />
              </>
            )
          }
        />
      )}
    </Screen>
  );
}

function SearchArea({
  q,
  onOpenSpec,
  onOpenModel,
}: {
  q: string;
  onOpenSpec: (id: number) => void;
  onOpenModel: (id: number) => void;
}) {
  const search = useSearchQuery(q);
  const plans = usePlansQuery({ q }, q.trim() !== '');
  const router = useRouter();
  if (q.trim() === '') return null;
  const planHits = plans.data?.length ? (
    <View style={styles.plans} testID="search-plans">
      <Text variant="heading">Test plans for this symptom</Text>
      <PlanList plans={plans.data.slice(0, 3)} onOpen={(p) => router.push(`/plans/${p.id}`)} />
    </View>
  ) : null;
  if (search.isPending) return planHits ?? <LoadingState label="Searching" />;
  if (search.error) return <ErrorState message={describeError(search.error)} onRetry={search.refetch} />;
  if (search.data.total === 0)
    return planHits ?? <EmptyState message={`Nothing matches “${q}”. Try a make, a model or a part name.`} />;
  return (
    <>
      {planHits}
      <SearchResults result={search.data} onOpenSpec={onOpenSpec} onOpenModel={onOpenModel} />
    </>
  );
}

function BrowseModels({ onOpenModel, columns = false }: { onOpenModel: (id: number) => void; columns?: boolean }) {
  const models = useModelsQuery();
  if (models.isPending) return <LoadingState label="Loading models" />;
  if (models.error) return <ErrorState message={describeError(models.error)} onRetry={models.refetch} />;
  if (models.data.length === 0)
    return <EmptyState message="The library is empty. An editor can import specs from CSV." />;
  return <ModelList models={models.data} onOpenModel={onOpenModel} columns={columns} />;
}

const styles = StyleSheet.create({
  intro: { gap: Spacing.xs },
  browse: { gap: Spacing.md },
  calcButton: { alignSelf: 'flex-start' },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: Spacing.sm },
  plans: { gap: Spacing.sm },
});
