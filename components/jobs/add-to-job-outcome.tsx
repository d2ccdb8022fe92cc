import { StyleSheet, View } from 'react-native';
import type { ShownOutcome } from '@/lib/hooks/use-add-to-job';
import { isLocalJobId } from '@/lib/offline/reading-queue';
import { Spacing } from '@/lib/theme';
import { jobRef } from './job-format';
import { Button } from '../ui/button';
import { Text } from '../ui/text';

export type AddToJobOutcomeProps = { outcome: ShownOutcome; jobId: number; onOpen: () => void };

/** What became of a reading sent from the calculator: added, queued on the device, or refused; and the way to its sheet. */
export function AddToJobOutcome({ outcome, jobId, onOpen }: AddToJobOutcomeProps) {
  const message =
    outcome.status === 'sent'
      ? `Added to ${jobRef(jobId)}`
      : outcome.status === 'delivered'
        ? `Sent — added to ${jobRef(jobId)}`
        : outcome.status === 'queued'
          ? 'Queued — will send when online'
          : `Not added: ${outcome.message}`;
  return (
    <View style={styles.outcome} accessibilityRole="alert" accessibilityLiveRegion="polite">
      <Text
        variant="label"
        color={
          outcome.status === 'sent' || outcome.status === 'delivered'
            ? 'pass'
            : outcome.status === 'queued'
              ? 'text'
              : 'fail'
        }
        testID="add-to-job-outcome"
      >
        {message}
      </Text>
      <Button
        label={isLocalJobId(jobId) ? 'Open the new job sheet' : `Open job sheet #${jobId}`}
        variant="quiet"
        onPress={onOpen}
        style={styles.link}
        testID="add-to-job-open"
      />
    </View>
  );
}

const styles = StyleSheet.create({
  outcome: { gap: Spacing.xs },
  link: { alignSelf: 'flex-start', paddingHorizontal: 0 },
});
