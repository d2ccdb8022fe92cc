import { useState } from 'react';
import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { EditorGate } from '@/components/spec-editor/editor-gate';
import { SpecEditForm } from '@/components/spec-editor/spec-edit-form';
import { specToForm, type SpecFormValues } from '@/components/spec-editor/spec-form-values';
import { StaleEditView } from '@/components/spec-editor/stale-edit-view';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { ApiError } from '@/lib/api/client';
import { staleCurrent } from '@/lib/api/curation';
import { describeError } from '@/lib/api/describe-error';
import type { UpdateSpecBody } from '@/lib/contracts/curation';
import type { SpecDetailDto } from '@/lib/contracts/library';
import { useUpdateSpecMutation } from '@/lib/hooks/use-curation';
import { useSpecQuery } from '@/lib/hooks/use-library';

/** What the form edits: the spec as loaded (frozen, so a background refetch cannot hide a conflict) and the first values shown. */
type Basis = { spec: SpecDetailDto; initial?: SpecFormValues };
type Conflict = { current: SpecDetailDto; body: UpdateSpecBody; mine: SpecFormValues };

const changedKeys = (body: UpdateSpecBody) => Object.keys(body).filter((k) => k !== 'version' && k !== 'reason');

export default function EditSpecScreen() {
  const { specId } = useLocalSearchParams<{ specId: string }>();
  const id = Number(specId);
  const router = useRouter();
  const spec = useSpecQuery(id);
  const update = useUpdateSpecMutation(id);
  const [basis, setBasis] = useState<Basis | null>(null);
  const [conflict, setConflict] = useState<Conflict | null>(null);
  // Start from a fresh copy, not a cached one that may already be out of date.
  if (spec.data && !basis && !spec.isFetching) setBasis({ spec: spec.data });

  const save = (body: UpdateSpecBody, mine: SpecFormValues) =>
    update.mutate(body, {
      // Back to the spec card the edit was opened from, or to it in place of the editor.
      // The card then says "Saved as version N" (a status message, announced).
      onSuccess: (saved) =>
        router.dismissTo({ pathname: '/specs/[specId]', params: { specId: saved.id, saved: saved.version } }),
      onError: (err) => {
        const current = staleCurrent(err);
        if (current) setConflict({ current, body, mine });
      },
    });
  const restart = (next: Basis) => {
    update.reset();
    setConflict(null);
    setBasis(next);
  };

  const body = () => {
    if (spec.isPending) return <LoadingState label="Loading the spec" />;
    if (spec.error) return <ErrorState message={describeError(spec.error)} onRetry={spec.refetch} />;
    if (!basis) return <LoadingState label="Loading the spec" />;
    if (conflict) {
      const { current, body: mineBody, mine } = conflict;
      const changed = changedKeys(mineBody);
      const onEditMine = () => {
        const now = specToForm(current);
        const carried = Object.fromEntries(changed.map((k) => [k, mine[k as keyof SpecFormValues]]));
        restart({ spec: current, initial: { ...now, ...carried, reason: mine.reason } });
      };
      return (
        <StaleEditView
          current={current}
          base={specToForm(basis.spec)}
          baseVersion={basis.spec.version}
          mine={mine}
          changed={changed}
          busy={update.isPending}
          error={update.error && !staleCurrent(update.error) ? describeError(update.error) : null}
          onReapply={() => save({ ...mineBody, version: current.version }, mine)}
          onEditMine={onEditMine}
          onDiscard={() => restart({ spec: current })}
        />
      );
    }
    const serverErrors = update.error instanceof ApiError ? update.error.errors : undefined;
    return (
      <>
        {update.error ? (
          <Text color="fail" accessibilityRole="alert">
            {describeError(update.error)}
          </Text>
        ) : null}
        <SpecEditForm
          key={basis.spec.version}
          base={specToForm(basis.spec)}
          version={basis.spec.version}
          initial={basis.initial}
          submitting={update.isPending}
          serverErrors={serverErrors}
          onSubmit={save}
        />
      </>
    );
  };

  return (
    <Screen testID="edit-spec-screen">
      <Stack.Screen options={{ title: basis ? `Edit: ${basis.spec.parameter}` : 'Edit spec' }} />
      <EditorGate reason="to edit specs">
        {basis ? (
          <Text variant="title">
            {basis.spec.component.name} — {basis.spec.parameter}
          </Text>
        ) : null}
        {body()}
      </EditorGate>
    </Screen>
  );
}
