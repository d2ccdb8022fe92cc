import { StyleSheet, View } from 'react-native';
import { Spacing } from '@/lib/theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';

export type JobActionsProps = {
  open: boolean;
  onReport: () => void;
  onCsv: () => void;
  csvPending?: boolean;
  csvError?: string | null;
  /** Absent for a machine that is not in the library. */
  onModelSheet?: () => void;
  onCalculator: () => void;
};

/** Taking readings for the job, and getting them out of it (report, CSV). */
export function JobActions({
  open,
  onReport,
  onCsv,
  csvPending,
  csvError,
  onModelSheet,
  onCalculator,
}: JobActionsProps) {
  return (
    <Card testID="job-actions">
      {open ? (
        <>
          <Text variant="heading">Take a reading</Text>
          <Text variant="small" color="textMuted">
            Check a reading on any spec card or in the calculator, then choose “Add to job”.
          </Text>
          <View style={styles.buttons}>
            {onModelSheet ? (
              <Button label="Open the model sheet" variant="secondary" onPress={onModelSheet} testID="job-open-model" />
            ) : null}
            <Button
              label="Calculator for limits typed by hand"
              variant="secondary"
              onPress={onCalculator}
              testID="job-open-calculator"
            />
          </View>
        </>
      ) : null}
      <Text variant="heading">For the customer</Text>
      <View style={styles.buttons}>
        <Button label="Printable report" onPress={onReport} accessibilityRole="link" testID="job-report-link" />
        <Button
          label={csvPending ? 'Preparing CSV…' : 'Download CSV'}
          variant="secondary"
          onPress={onCsv}
          disabled={csvPending}
          testID="job-csv"
        />
      </View>
      {csvError ? (
        <Text variant="small" color="fail" accessibilityRole="alert">
          {csvError}
        </Text>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({ buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: Spacing.sm } });
