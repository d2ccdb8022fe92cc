import { StyleSheet, View } from 'react-native';
import { MEASUREMENT_MODE_LABEL } from '@/lib/contracts/enums';
import type { RunStepDto } from '@/lib/contracts/plans';
import { Spacing } from '@/lib/theme';
import { SafetyNotes } from '../library/safety-notes';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { ConnectorFace } from './connector-face';

export type StepViewProps = { step: RunStepDto; total: number };

/** One step as the technician reads it at the machine: what to do, before what, where to probe, and the cautions. */
export function StepView({ step, total }: StepViewProps) {
  return (
    <Card testID="run-step">
      <Text variant="small" color="textMuted">
        Step {step.position + 1} of {total}
      </Text>
      <Text variant="title" accessibilityRole="header">
        {step.title}
      </Text>
      {step.preconditions.length ? (
        <View style={styles.block} testID="step-preconditions">
          <Text variant="label">Before you start</Text>
          {step.preconditions.map((p) => (
            <Text key={p}>☐ {p}</Text>
          ))}
        </View>
      ) : null}
      <Text>{step.instructions}</Text>
      <View style={styles.block}>
        <Text variant="label">Test point</Text>
        <Text testID="step-test-point">{step.testPoint.text}</Text>
        {step.spec?.mode ? (
          <Text variant="label" testID="step-meter-mode">
            Meter: {MEASUREMENT_MODE_LABEL[step.spec.mode]}
            {step.spec.engineRpm ? ` · engine at ${step.spec.engineRpm} rpm` : ''}
          </Text>
        ) : null}
        {step.spec?.testPoints ? (
          <Text variant="small" color="textMuted">
            Manual: {step.spec.testPoints}
            {step.spec.conditions ? ` · ${step.spec.conditions}` : ''}
          </Text>
        ) : null}
      </View>
      {step.connector ? (
        <ConnectorFace
          connector={step.connector}
          probe={step.testPoint.pins ?? []}
          title={`Connector: ${step.testPoint.component ?? 'component'}`}
        />
      ) : null}
      {step.cautions.length ? <SafetyNotes categories={step.cautions} /> : null}
    </Card>
  );
}

const styles = StyleSheet.create({ block: { gap: Spacing.xs } });
