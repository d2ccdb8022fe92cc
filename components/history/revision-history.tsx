import { useState } from 'react';
import { StyleSheet } from 'react-native';
import { describeError } from '@/lib/api/describe-error';
import { useRevertMutation, useRevisionsQuery } from '@/lib/hooks/use-curation';
import { useSession } from '@/lib/session/session-provider';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorState, LoadingState } from '../ui/states';
import { Text } from '../ui/text';
import { RevertForm } from './revert-form';
import { RevisionItem, originText } from './revision-item';

export type RevisionHistoryProps = { specId: number };

/** The spec's history, newest first, with each revision's diff; editors may revert to an earlier revision. */
export function RevisionHistory({ specId }: RevisionHistoryProps) {
  const history = useRevisionsQuery(specId);
  const revert = useRevertMutation(specId);
  const { can } = useSession();
  const [open, setOpen] = useState<number | null>(null);
  if (history.isPending)
    return (
      <Card>
        <LoadingState label="Loading the history" />
      </Card>
    );
  if (history.error)
    return (
      <Card>
        <ErrorState message={describeError(history.error)} onRetry={history.refetch} />
      </Card>
    );
  const { revisions, version } = history.data;
  const now = revisions[0]?.snapshot ?? {};
  const toggle = (id: number | null) => {
    revert.reset();
    setOpen(id);
  };
  return (
    <Card testID="revision-list">
      <Text variant="heading">History</Text>
      {revisions.length === 0 ? <Text color="textMuted">No recorded changes.</Text> : null}
      {revisions.map((r, i) => (
        <RevisionItem key={r.id} revision={r} origin={originText(r, revisions)} current={i === 0}>
          {can('editor') && i > 0 && open !== r.id ? (
            <Button
              label="Revert to this revision"
              variant="quiet"
              style={styles.action}
              onPress={() => toggle(r.id)}
              testID={`revert-${r.version}`}
            />
          ) : null}
          {open === r.id ? (
            <RevertForm
              revision={r}
              now={now}
              version={version}
              busy={revert.isPending}
              error={revert.error}
              onCancel={() => toggle(null)}
              onSubmit={(reason, base) =>
                revert.mutate({ revisionId: r.id, version: base, reason }, { onSuccess: () => setOpen(null) })
              }
            />
          ) : null}
        </RevisionItem>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({ action: { alignSelf: 'flex-start', paddingHorizontal: 0 } });
