import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { describeError } from '@/lib/api/describe-error';
import type { ImportPreviewDto } from '@/lib/contracts/imports';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { LinkRow } from '../ui/link-row';
import { Text } from '../ui/text';

export type CommitPanelProps = {
  preview: ImportPreviewDto;
  committing: boolean;
  error: unknown;
  onCommit: () => void;
  onOpenSpec: (id: number) => void;
};

const plural = (n: number, one: string) => `${n} ${one}${n === 1 ? '' : 's'}`;

/** Commit a previewed batch once; afterwards, what it wrote and links to those specs. */
export function CommitPanel({ preview: p, committing, error, onCommit, onOpenSpec }: CommitPanelProps) {
  const t = useTheme();
  const { created, updated, rejected } = p.counts;
  if (p.status === 'failed') return null;
  if (p.status === 'committed') {
    const written = [...p.created, ...p.updated].filter((r) => r.specId !== null);
    return (
      <Card testID="commit-done" style={{ backgroundColor: t.passSurface, borderColor: t.pass }}>
        <Text variant="heading" color="pass">
          Committed
        </Text>
        <Text>
          {plural(created, 'spec')} created and {plural(updated, 'spec')} updated
          {p.committedByName ? ` by ${p.committedByName}` : ''}
          {p.committedAt ? ` on ${new Date(p.committedAt).toLocaleString()}` : ''}. Each changed spec has a new revision
          (batch #{p.id}).
        </Text>
        {written.map((r) => (
          <LinkRow
            key={r.line}
            href={`/specs/${r.specId}`}
            accessibilityLabel={`Open ${r.component} — ${r.parameter}`}
            onPress={() => onOpenSpec(r.specId!)}
            style={styles.link}
            testID={`committed-spec-${r.specId}`}
          >
            <Text color="primary">
              {r.make} {r.model} · {r.component} — {r.parameter}: {r.display}
            </Text>
          </LinkRow>
        ))}
      </Card>
    );
  }
  const nothing = created + updated === 0;
  return (
    <Card testID="commit-panel">
      <Text variant="heading">Commit</Text>
      <Text color="textMuted">
        {nothing
          ? 'Nothing to commit: every row is unchanged or rejected.'
          : `Writes ${plural(created, 'new spec')} and ${plural(updated, 'update')} in one step, each with a revision.`}
        {rejected ? ` The ${plural(rejected, 'rejected row')} ${rejected === 1 ? 'is' : 'are'} skipped.` : ''}
      </Text>
      {error ? (
        <Text color="fail" accessibilityRole="alert">
          {describeError(error)}
        </Text>
      ) : null}
      <View style={styles.row}>
        <Button
          label={committing ? 'Committing…' : 'Commit'}
          disabled={nothing || committing}
          onPress={onCommit}
          testID="commit-button"
        />
        {committing ? <ActivityIndicator color={t.primary} accessibilityLabel="Committing" /> : null}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: Spacing.md },
  link: { minHeight: 44, justifyContent: 'center' },
});
