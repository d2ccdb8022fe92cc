import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { AddToJobTarget } from '@/lib/hooks/use-add-to-job';
import type { ReadingDraft } from '@/lib/offline/reading-body';
import { evaluateCheck, type BeepCheck, type DiodeState } from '@/lib/verdict';
import { Spacing } from '@/lib/theme';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { ChoiceRow } from '../ui/choice-row';
import { AddToJob } from '../jobs/add-to-job';

const DIODE: { value: DiodeState; label: string }[] = [
  { value: 'conducts', label: 'Conducts' },
  { value: 'open', label: 'Open' },
];

export type QualitativeCheckProps = {
  kind: 'diode' | 'continuity';
  /** Where "Add to job" sends the result (as for the calculator). */
  job?: AddToJobTarget;
  /** Shown above the tests, e.g. for a meter that only beeps on a spec with a forward voltage. */
  intro?: string;
};

/** Checks with no number: a diode conducts one way only; a fuse has continuity. The result can go on a job. */
export function QualitativeCheck({ kind, job, intro }: QualitativeCheckProps) {
  const [forward, setForward] = useState<DiodeState | null>(null);
  const [reverse, setReverse] = useState<DiodeState | null>(null);
  const [continuity, setContinuity] = useState<boolean | null>(null);
  let check: BeepCheck | null = null;
  if (kind === 'diode' && forward && reverse) check = { kind, forward, reverse };
  if (kind === 'continuity' && continuity !== null) check = { kind, continuity };
  const result = check ? evaluateCheck(check) : null;
  const draft: ReadingDraft | null = check ? { kind: 'check', check } : null;
  return (
    <Card testID="qualitative-check">
      {intro ? <Text color="textMuted">{intro}</Text> : null}
      {kind === 'diode' ? (
        <>
          <Text variant="heading">Diode test (meter on diode range)</Text>
          <ChoiceRow
            label="Red probe on anode, black on cathode"
            options={DIODE}
            value={forward}
            onChange={setForward}
          />
          <ChoiceRow label="Probes swapped" options={DIODE} value={reverse} onChange={setReverse} />
        </>
      ) : (
        <>
          <Text variant="heading">Continuity (fuse, switch, wire)</Text>
          <ChoiceRow
            label="Meter shows"
            options={[
              { value: true, label: 'Continuity' },
              { value: false, label: 'Open circuit' },
            ]}
            value={continuity}
            onChange={setContinuity}
          />
        </>
      )}
      {result ? (
        <View style={styles.result} testID="qualitative-result">
          <Text variant="title" color={result.verdict}>
            {result.verdict.toUpperCase()}
          </Text>
          <Text>{result.reason}</Text>
        </View>
      ) : null}
      <AddToJob draft={draft} verdict={result?.verdict ?? null} {...job} />
    </Card>
  );
}

const styles = StyleSheet.create({ result: { gap: Spacing.xs } });
