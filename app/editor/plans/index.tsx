import { Stack, useRouter } from 'expo-router';
import { EditorGate } from '@/components/spec-editor/editor-gate';
import { PlanJsonForm } from '@/components/plans/plan-json-form';
import { PlanList } from '@/components/plans/plan-list';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { MainAndSide } from '@/components/ui/main-and-side';
import { Screen } from '@/components/ui/screen';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { Text } from '@/components/ui/text';
import { describeError } from '@/lib/api/describe-error';
import { saveFile } from '@/lib/api/save-file';
import { PLAN_FILE_FORMAT } from '@/lib/contracts/plans';
import { usePlanFileMutations, usePlansQuery } from '@/lib/hooks/use-plans';

const TEMPLATE = JSON.stringify({ format: PLAN_FILE_FORMAT, plans: [], connectors: [] }, null, 2);

/** Editors: every plan (drafts too), the plan file's export, and its import with errors by JSON path. */
export default function PlanEditorListScreen() {
  const router = useRouter();
  const plans = usePlansQuery({});
  const { imports, exports } = usePlanFileMutations();
  const download = () =>
    exports.mutate(undefined, {
      onSuccess: (file) =>
        saveFile(new Blob([JSON.stringify(file, null, 2)], { type: 'application/json' }), 'specbench-plans.json'),
    });
  const done = imports.data
    ? `Imported: ${imports.data.created} created, ${imports.data.updated} updated, ${imports.data.unchanged} unchanged, ${imports.data.connectors} connectors.`
    : null;
  return (
    <Screen testID="plan-editor-list">
      <Stack.Screen options={{ title: 'Edit test plans' }} />
      <EditorGate reason="Sign in as an editor to curate the test plans.">
        <Text variant="title">Test plans</Text>
        <MainAndSide
          main={
            plans.isPending ? (
              <LoadingState label="Loading the plans" />
            ) : plans.error ? (
              <ErrorState message={describeError(plans.error)} onRetry={plans.refetch} />
            ) : (
              <PlanList plans={plans.data} actionLabel="Edit" onOpen={(p) => router.push(`/editor/plans/${p.id}`)} />
            )
          }
          side={
            <Card>
              <Text variant="heading">Plan file (JSON)</Text>
              <Button
                label={exports.isPending ? 'Preparing…' : 'Export every plan and connector'}
                variant="secondary"
                onPress={download}
              />
              <PlanJsonForm
                label="Paste a plan file to import"
                initial={TEMPLATE}
                submitLabel="Import the file"
                pending={imports.isPending}
                error={imports.error}
                done={done}
                onSubmit={(file) => imports.mutate(file)}
              />
            </Card>
          }
        />
      </EditorGate>
    </Screen>
  );
}
