import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { evaluateContinuity, evaluateDiode, type DiodeState, type QualitativeResult } from '@/lib/verdict';
import { Spacing } from '@/lib/theme';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { ChoiceRow } from '../ui/choice-row';

const DIODE: { value: DiodeState; label: string }[] = [
  { value: 'conducts', label: 'Conducts' },
  { value: 'open', label: 'Open' },
];

/** Checks with no number: a diode conducts one way only; a fuse has continuity. */
export function QualitativeCheck({ kind }: { kind: 'diode' | 'continuity' }) {
  const [forward, setForward] = useState<DiodeState | null>(null);
  const [reverse, setReverse] = useState<DiodeState | null>(null);
  const [continuity, setContinuity] = useState<boolean | null>(null);
  let result: QualitativeResult | null = null;
  if (kind === 'diode' && forward && reverse) result = evaluateDiode({ forward, reverse });
  if (kind === 'continuity' && continuity !== null) result = evaluateContinuity({ continuity });
  return (
    <Card testID="qualitative-check">
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
    </Card>
  );
}

const styles = StyleSheet.create({ result: { gap: Spacing.xs } });
