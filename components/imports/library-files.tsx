import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { describeError } from '@/lib/api/describe-error';
import { useDownloadTemplateMutation, useExportMutation } from '@/lib/hooks/use-curation';
import { Spacing } from '@/lib/theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { ColumnReference } from './column-reference';

/** The template and column reference for writing a file, and the library exported in the same format. */
export function LibraryFiles({ wide }: { wide: boolean }) {
  const template = useDownloadTemplateMutation();
  const exporter = useExportMutation();
  const [make, setMake] = useState('');
  return (
    <>
      <Card testID="library-export">
        <Text variant="heading">Export the library</Text>
        <TextField
          label="Only this make (optional)"
          value={make}
          onChangeText={setMake}
          placeholder="All makes"
          testID="export-make"
        />
        <View style={styles.row}>
          <Button
            label={exporter.isPending ? 'Exporting…' : 'Export the library as CSV'}
            variant="secondary"
            disabled={exporter.isPending}
            onPress={() => exporter.mutate(make.trim() || undefined)}
            testID="export-csv"
          />
        </View>
        {exporter.error ? (
          <Text color="fail" accessibilityRole="alert">
            {describeError(exporter.error)}
          </Text>
        ) : null}
      </Card>
      <Card testID="csv-template">
        <Text variant="heading">The file format</Text>
        <Text color="textMuted">
          UTF-8 CSV with a header row. A row matches a spec by make, model, years, variant, component and parameter.
        </Text>
        <Button
          label="Download the template"
          variant="secondary"
          style={styles.button}
          onPress={() => template.mutate()}
          disabled={template.isPending}
          testID="download-template"
        />
        {template.error ? (
          <Text color="fail" accessibilityRole="alert">
            {describeError(template.error)}
          </Text>
        ) : null}
        <ColumnReference initiallyOpen={wide} />
      </Card>
    </>
  );
}

const styles = StyleSheet.create({
  button: { alignSelf: 'flex-start' },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: Spacing.sm },
});
