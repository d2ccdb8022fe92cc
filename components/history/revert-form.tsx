import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { staleCurrent } from '@/lib/api/curation';
import { describeError } from '@/lib/api/describe-error';
import type { RevisionDiffDto } from '@/lib/contracts/curation';
import { Spacing } from '@/lib/theme';
import { Button } from '../ui/button';
import { Caution } from '../ui/caution';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { FieldChanges } from './field-changes';
import { revertChanges, snapshotOfDetail, type Snapshot } from './revert-diff';

export type RevertFormProps = {
  revision: RevisionDiffDto;
  /** The values and version the history shows as current. */
  now: Snapshot;
  version: number;
  busy: boolean;
  error: unknown;
  onSubmit: (reason: string, version: number) => void;
  onCancel: () => void;
};

/** Revert to one revision: what it changes, why (required); on a stale version, the current values first. */
export function RevertForm({ revision, now, version, busy, error, onSubmit, onCancel }: RevertFormProps) {
  const [reason, setReason] = useState('');
  const current = staleCurrent(error);
  const base = current ? snapshotOfDetail(current) : now;
  const changes = revertChanges(base, revision.snapshot);
  const ready = reason.trim().length >= 3 && !busy;
  return (
    <View style={styles.box} testID={`revert-form-${revision.version}`}>
      {current ? (
        <Caution
          title="the spec changed since this history was loaded"
          testID="revert-stale"
          lines={[
            `It is now at version ${current.version}, not ${version}. Nothing was reverted.`,
            'Check what the revert would change now, then confirm again.',
          ]}
        />
      ) : null}
      <Text variant="label">Reverting to version {revision.version} changes:</Text>
      {changes.length ? (
        <FieldChanges changes={changes} />
      ) : (
        <Text variant="small" color="textMuted">
          Nothing: the spec already has these values.
        </Text>
      )}
      <TextField
        label="Why revert? (required)"
        value={reason}
        onChangeText={setReason}
        multiline
        testID="revert-reason"
      />
      {error && !current ? (
        <Text color="fail" accessibilityRole="alert">
          {describeError(error)}
        </Text>
      ) : null}
      <View style={styles.buttons}>
        <Button
          label={busy ? 'Reverting…' : current ? `Revert on version ${current.version}` : 'Revert'}
          disabled={!ready}
          onPress={() => onSubmit(reason, current?.version ?? version)}
          testID="revert-confirm"
        />
        <Button label="Cancel" variant="quiet" onPress={onCancel} disabled={busy} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: Spacing.sm, paddingTop: Spacing.sm },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: Spacing.sm },
});
