import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { RunResultBody, RunStepDto } from '@/lib/contracts/plans';
import { Spacing } from '@/lib/theme';
import { Button } from '../ui/button';
import { ChoiceRow } from '../ui/choice-row';
import { Text } from '../ui/text';

export type OutcomeChoiceProps = {
  step: RunStepDto;
  pending: boolean;
  onSubmit: (body: Omit<RunResultBody, 'stepId'>) => void;
};

type DiodeState = 'conducts' | 'open';

/** Big choices for checks judged by eye or by the meter's continuity / diode mode, and an observation's choices. */
export function OutcomeChoice({ step, pending, onSubmit }: OutcomeChoiceProps) {
  const [forward, setForward] = useState<DiodeState | null>(null);
  const [reverse, setReverse] = useState<DiodeState | null>(null);
  const check = step.check;
  if (check.kind === 'observation')
    return (
      <View style={styles.col}>
        {check.choices.map((c) => (
          <Button
            key={c.id}
            label={c.label}
            variant="secondary"
            disabled={pending}
            onPress={() => onSubmit({ outcome: c.id })}
            style={styles.big}
            testID={`choice-${c.id}`}
          />
        ))}
      </View>
    );
  if (check.kind !== 'qualitative') return null;
  if (check.test === 'diode') {
    const states = [
      { value: 'conducts' as const, label: 'Conducts' },
      { value: 'open' as const, label: 'Open (OL)' },
    ];
    return (
      <View style={styles.col}>
        <Text variant="label">Expected: {check.expected}</Text>
        <ChoiceRow label="Forward (red on the anode)" options={states} value={forward} onChange={setForward} />
        <ChoiceRow label="Reverse (probes swapped)" options={states} value={reverse} onChange={setReverse} />
        <Button
          label="Judge the diode"
          disabled={pending || !forward || !reverse}
          onPress={() => forward && reverse && onSubmit({ diode: { forward, reverse } })}
          testID="diode-submit"
        />
      </View>
    );
  }
  return (
    <View style={styles.col}>
      <Text variant="label">Expected: {check.expected}</Text>
      <View style={styles.row}>
        <Button
          label="Pass: as expected"
          disabled={pending}
          onPress={() => onSubmit({ outcome: 'pass' })}
          style={[styles.big, styles.half]}
          testID="outcome-pass"
        />
        <Button
          label="Fail: not as expected"
          variant="secondary"
          disabled={pending}
          onPress={() => onSubmit({ outcome: 'fail' })}
          style={[styles.big, styles.half]}
          testID="outcome-fail"
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  col: { gap: Spacing.md },
  row: { flexDirection: 'row', gap: Spacing.md, flexWrap: 'wrap' },
  big: { minHeight: 64 },
  half: { flexGrow: 1, flexBasis: 140 },
});
