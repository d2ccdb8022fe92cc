import type { ReactNode } from 'react';
import { citationText } from '@/lib/format/citation';
import { StyleSheet, View } from 'react-native';
import type { CorrectionDto, SpecCorrectionDto } from '@/lib/contracts/corrections';
import { formatRange, parseUnit } from '@/lib/units';
import { Spacing } from '@/lib/theme';
import { Card } from '../ui/card';
import { Text } from '../ui/text';

const STATUS = {
  pending: 'Waiting for an editor',
  accepted: 'Accepted',
  rejected: 'Not accepted',
  withdrawn: 'Withdrawn',
} as const;
const COLOR = { pending: 'marginal', accepted: 'pass', rejected: 'fail', withdrawn: 'textMuted' } as const;
const KIND = {
  change: 'Change',
  new_spec: 'Missing spec',
  new_component: 'Missing component',
  plan_change: 'Test plan change',
} as const;

function proposedRange(c: SpecCorrectionDto): string {
  const unit = parseUnit(c.proposed.unit)?.unit;
  return unit
    ? formatRange(c.proposed.min, c.proposed.nominal, c.proposed.max, unit)
    : `${c.proposed.min ?? ''}–${c.proposed.max ?? ''} ${c.proposed.unit}`;
}

export type CorrectionCardProps = {
  c: CorrectionDto;
  /** For editors: who proposed it and how their proposals fared so far. */
  showProposer?: boolean;
  children?: ReactNode;
};

/** One proposal: what, where, proposed values, status and the editor's note. Text is shown as text, never HTML. */
export function CorrectionCard({ c, showProposer = false, children }: CorrectionCardProps) {
  return (
    <Card testID={`correction-${c.id}`}>
      <View style={styles.top}>
        <Text variant="label" color={COLOR[c.status]}>
          #{c.id} · {STATUS[c.status]}
        </Text>
        <Text variant="small" color="textMuted">
          {KIND[c.kind]} · {new Date(c.createdAt).toLocaleDateString()}
        </Text>
      </View>
      <Text variant="small" color="textMuted">
        {c.modelTitle ?? 'Every model with these parts'}
      </Text>
      {c.kind === 'plan_change' ? (
        <Text variant="heading">Test plan: {c.plan.title}</Text>
      ) : (
        <>
          <Text variant="heading">
            {c.componentName} — {c.parameter}
          </Text>
          <Text>
            Proposed: <Text variant="label">{proposedRange(c)}</Text>
          </Text>
        </>
      )}
      <Text variant="small" color="textMuted">
        Source: {citationText(c.citation, c.citation.page)}
      </Text>
      <Text variant="small">“{c.rationale}”</Text>
      {c.decisionNote ? (
        <Text variant="small" testID={`decision-${c.id}`}>
          Note from {c.reviewerName}: {c.decisionNote}
        </Text>
      ) : null}
      {showProposer ? (
        <Text variant="small" color="textMuted" testID={`proposer-${c.id}`}>
          By {c.proposer.name} · {c.proposer.accepted} accepted, {c.proposer.rejected} not accepted so far
        </Text>
      ) : null}
      {children}
    </Card>
  );
}

const styles = StyleSheet.create({
  top: { flexDirection: 'row', justifyContent: 'space-between', flexWrap: 'wrap', gap: Spacing.sm },
});
