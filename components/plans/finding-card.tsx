import type { RunDto } from '@/lib/contracts/plans';
import { Card } from '../ui/card';
import { Text } from '../ui/text';

export type FindingCardProps = { finding: NonNullable<RunDto['finding']>; stepTitle: string };

/** The run's conclusion: the likely faulty part and what to do, in plain words. */
export function FindingCard({ finding, stepTitle }: FindingCardProps) {
  return (
    <Card testID="run-finding" accessibilityRole="summary">
      <Text variant="label" color="textMuted">
        Finding (after “{stepTitle}”)
      </Text>
      <Text variant="title">{finding.part}</Text>
      <Text>{finding.advice}</Text>
    </Card>
  );
}
