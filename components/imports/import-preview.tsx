import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { ImportPreviewDto } from '@/lib/contracts/imports';
import { Spacing } from '@/lib/theme';
import { Button } from '../ui/button';
import { Text } from '../ui/text';
import { FieldChanges } from '../history/field-changes';
import { ImportGroup } from './import-group';
import { ImportRow, ProblemRow } from './import-row';

export type ImportPreviewProps = {
  preview: ImportPreviewDto;
  onOpenSpec: (id: number) => void;
  onPage: (offset: number) => void;
};

/** The dry run's rows, grouped as created, updated (field by field), unchanged, rejected and warnings. */
export function ImportPreview({ preview: p, onOpenSpec, onPage }: ImportPreviewProps) {
  const [showUnchanged, setShowUnchanged] = useState(false);
  const warnings = [...p.created, ...p.updated, ...p.unchanged]
    .flatMap((r) => r.warnings)
    .sort((a, b) => a.line - b.line);
  const { offset, limit } = p.page;
  const largest = Math.max(p.counts.created, p.counts.updated, p.counts.unchanged, p.counts.rejected);
  return (
    <View style={styles.wrap} testID="import-preview">
      {p.fileErrors.length ? (
        <ImportGroup title="The file cannot be imported" total={p.fileErrors.length} testID="import-file-errors">
          {p.fileErrors.map((e, i) => (
            <ProblemRow key={i} problem={e} />
          ))}
        </ImportGroup>
      ) : null}
      {p.counts.created ? (
        <ImportGroup title="New specs" total={p.counts.created} testID="import-created">
          {p.created.map((r) => (
            <ImportRow key={r.line} row={r} onOpenSpec={onOpenSpec} />
          ))}
        </ImportGroup>
      ) : null}
      {p.counts.updated ? (
        <ImportGroup
          title="Updated specs"
          total={p.counts.updated}
          note="Each field: the library's value → the file's value."
          testID="import-updated"
        >
          {p.updated.map((r) => (
            <ImportRow key={r.line} row={r} onOpenSpec={onOpenSpec}>
              <FieldChanges changes={r.changes} testID={`import-changes-${r.line}`} />
            </ImportRow>
          ))}
        </ImportGroup>
      ) : null}
      {p.counts.unchanged ? (
        <ImportGroup
          title="Unchanged"
          total={p.counts.unchanged}
          note="Already in the library with these values; the commit leaves them alone."
          testID="import-unchanged"
        >
          <Button
            label={showUnchanged ? 'Hide unchanged rows' : `Show ${p.unchanged.length} unchanged rows`}
            variant="quiet"
            style={styles.toggle}
            onPress={() => setShowUnchanged(!showUnchanged)}
            testID="toggle-unchanged"
          />
          {showUnchanged ? p.unchanged.map((r) => <ImportRow key={r.line} row={r} onOpenSpec={onOpenSpec} />) : null}
        </ImportGroup>
      ) : null}
      {p.counts.rejected ? (
        <ImportGroup
          title="Rejected rows"
          total={p.counts.rejected}
          note="Not imported. Fix these lines in the file and import it again."
          testID="import-rejected"
        >
          {p.rejected.map((e, i) => (
            <ProblemRow key={`${e.line}-${i}`} problem={e} />
          ))}
        </ImportGroup>
      ) : null}
      {warnings.length ? (
        <ImportGroup
          title="Warnings"
          total={warnings.length}
          note="Accepted, but unusual: check them against the source."
          testID="import-warnings"
        >
          {warnings.map((w, i) => (
            <ProblemRow key={`${w.line}-${i}`} problem={w} />
          ))}
        </ImportGroup>
      ) : null}
      {largest > limit ? (
        <View style={styles.pager}>
          <Text variant="small" color="textMuted">
            Rows {offset + 1}–{Math.min(offset + limit, largest)} of each group
          </Text>
          <Button
            label="Previous rows"
            variant="secondary"
            disabled={offset === 0}
            onPress={() => onPage(Math.max(0, offset - limit))}
          />
          <Button
            label="Next rows"
            variant="secondary"
            disabled={offset + limit >= largest}
            onPress={() => onPage(offset + limit)}
          />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: Spacing.md },
  toggle: { alignSelf: 'flex-start', paddingHorizontal: 0 },
  pager: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: Spacing.sm },
});
