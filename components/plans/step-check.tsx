import { StyleSheet } from 'react-native';
import type { RunResultBody, RunStepDto } from '@/lib/contracts/plans';
import { Spacing } from '@/lib/theme';
import { Card } from '../ui/card';
import { MeasuredForm } from './measured-form';
import { OutcomeChoice } from './outcome-choice';
import { SkipForm } from './skip-form';

export type StepCheckProps = {
  step: RunStepDto;
  pending: boolean;
  onSubmit: (body: Omit<RunResultBody, 'stepId'>) => void;
};

/** What the technician enters for the step: a reading, a pass / fail, a diode's two tests or a choice; or a skip. */
export function StepCheck({ step, pending, onSubmit }: StepCheckProps) {
  const measured = step.check.kind === 'spec' || step.check.kind === 'limits';
  return (
    <Card testID="step-check" style={styles.card}>
      {measured ? (
        <MeasuredForm key={step.id} step={step} pending={pending} onSubmit={(reading) => onSubmit({ reading })} />
      ) : (
        <OutcomeChoice key={step.id} step={step} pending={pending} onSubmit={onSubmit} />
      )}
      <SkipForm key={`skip-${step.id}`} pending={pending} onSkip={(skipReason) => onSubmit({ skipReason })} />
    </Card>
  );
}

const styles = StyleSheet.create({ card: { gap: Spacing.md } });
