import type { RunDto } from '@/lib/contracts/plans';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { RunList } from './run-list';

export type JobDiagnosisProps = {
  open: boolean;
  runs: RunDto[];
  onDiagnose: () => void;
  onOpenRun: (run: RunDto) => void;
};

/** On the job sheet: start a guided diagnosis by symptom, and the plan runs already on the job. */
export function JobDiagnosis({ open, runs, onDiagnose, onOpenRun }: JobDiagnosisProps) {
  return (
    <Card testID="job-diagnosis">
      <Text variant="heading">Guided diagnosis</Text>
      {open ? (
        <>
          <Text variant="small" color="textMuted">
            A test plan takes you from the symptom to the faulty part, one step at a time; every reading lands on this
            job.
          </Text>
          <Button label="Diagnose with a test plan" onPress={onDiagnose} testID="job-diagnose" />
        </>
      ) : null}
      {runs.length ? <RunList runs={runs} onOpen={onOpenRun} /> : null}
    </Card>
  );
}
