import { ActivityIndicator, StyleSheet, View } from 'react-native';
import * as DocumentPicker from 'expo-document-picker';
import { ApiError } from '@/lib/api/client';
import { describeError } from '@/lib/api/describe-error';
import type { UploadFile } from '@/lib/api/upload';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { ProgressBar } from './progress-bar';

export type UploadPanelProps = {
  uploading: boolean;
  /** 0…1 while the bytes go up; the server then checks every row. */
  progress: number;
  fileName: string | null;
  error: unknown;
  onPick: (file: UploadFile) => void;
};

// '.csv' too: some systems label CSV files application/vnd.ms-excel.
const CSV_TYPES = ['text/csv', '.csv'];

/** Choose a CSV file and send it for a dry run; the upload's progress, then the file's problems if it cannot be read. */
export function UploadPanel({ uploading, progress, fileName, error, onPick }: UploadPanelProps) {
  const t = useTheme();
  const pick = async () => {
    const result = await DocumentPicker.getDocumentAsync({
      type: CSV_TYPES,
      base64: false,
      copyToCacheDirectory: true,
      multiple: false,
    });
    const asset = result.canceled ? null : result.assets[0];
    if (asset) onPick({ name: asset.name, mimeType: asset.mimeType || 'text/csv', file: asset.file, uri: asset.uri });
  };
  const problems = error instanceof ApiError ? error.errors : [];
  return (
    <Card testID="upload-panel">
      <Text variant="heading">Import a CSV file</Text>
      <Text color="textMuted">
        Nothing changes yet: you will see what the file would create, update and reject, then commit.
      </Text>
      <Button
        label={uploading ? 'Uploading…' : 'Choose a CSV file'}
        onPress={pick}
        disabled={uploading}
        style={styles.button}
        testID="pick-csv"
      />
      {uploading ? (
        <View style={styles.progress} testID="upload-progress">
          <Text variant="small">
            {progress < 1
              ? `Uploading ${fileName ?? 'the file'} — ${Math.round(progress * 100)} %`
              : `Checking every row of ${fileName ?? 'the file'}…`}
          </Text>
          <ProgressBar label="Upload progress" fraction={progress} />
          {progress >= 1 ? <ActivityIndicator color={t.primary} /> : null}
        </View>
      ) : null}
      {error ? (
        <View style={styles.problems} accessibilityRole="alert" testID="upload-error">
          <Text color="fail">{describeError(error)}</Text>
          {problems.slice(0, 50).map((p, i) => (
            <Text key={i} variant="small">
              {p.path}: {p.message}
            </Text>
          ))}
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  button: { alignSelf: 'flex-start' },
  progress: { gap: Spacing.xs },
  problems: { gap: 2 },
});
