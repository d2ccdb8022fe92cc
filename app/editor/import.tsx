import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { CommitPanel } from '@/components/imports/commit-panel';
import { EditorGate } from '@/components/spec-editor/editor-gate';
import { ImportCounts } from '@/components/imports/import-counts';
import { ImportPreview } from '@/components/imports/import-preview';
import { LibraryFiles } from '@/components/imports/library-files';
import { RecentImports } from '@/components/imports/recent-imports';
import { UploadPanel } from '@/components/imports/upload-panel';
import { MainAndSide } from '@/components/ui/main-and-side';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { describeError } from '@/lib/api/describe-error';
import type { UploadFile } from '@/lib/api/upload';
import { useCommitImportMutation, useImportQuery, useUploadImportMutation } from '@/lib/hooks/use-curation';
import { useIsWide } from '@/lib/theme/use-theme';

/** Upload a CSV, read the dry run, commit once. The batch id sits in the address, so a reload keeps the preview. */
export default function ImportScreen() {
  const { batch } = useLocalSearchParams<{ batch?: string }>();
  const batchId = batch && Number(batch) > 0 ? Number(batch) : null;
  const router = useRouter();
  const wide = useIsWide();
  const [offset, setOffset] = useState(0);
  const [fileName, setFileName] = useState<string | null>(null);
  const upload = useUploadImportMutation();
  const preview = useImportQuery(batchId, offset);
  const commit = useCommitImportMutation(batchId ?? 0);

  const open = (id: number) => {
    setOffset(0);
    commit.reset();
    upload.reset();
    router.setParams({ batch: String(id) });
  };
  const pick = (file: UploadFile) => {
    setFileName(file.name);
    upload.mutate(file, { onSuccess: (p) => open(p.id) });
  };
  const openSpec = (id: number) => router.push(`/specs/${id}`);

  const batchView = () => {
    if (batchId === null || upload.isPending) return null;
    if (preview.isPending) return <LoadingState label="Loading the preview" />;
    if (preview.error) return <ErrorState message={describeError(preview.error)} onRetry={preview.refetch} />;
    const p = preview.data;
    return (
      <>
        <View style={styles.title}>
          <Text variant="heading">
            Import #{p.id}: {p.fileName}
          </Text>
          <Text variant="small" color="textMuted">
            Uploaded by {p.uploaderName} · {new Date(p.createdAt).toLocaleString()}
          </Text>
        </View>
        <ImportCounts counts={p.counts} />
        <CommitPanel
          preview={p}
          committing={commit.isPending}
          error={commit.error}
          onCommit={() => commit.mutate()}
          onOpenSpec={openSpec}
        />
        <ImportPreview preview={p} onOpenSpec={openSpec} onPage={setOffset} />
      </>
    );
  };

  return (
    <Screen testID="import-screen">
      <Stack.Screen options={{ title: 'Import specs' }} />
      <EditorGate reason="to import specs">
        <Text variant="title">Import specs from CSV</Text>
        <MainAndSide
          main={
            <>
              <UploadPanel
                uploading={upload.isPending}
                progress={upload.progress}
                fileName={fileName}
                error={upload.error}
                onPick={pick}
              />
              {batchView()}
            </>
          }
          side={
            <>
              <RecentImports selectedId={batchId} onOpen={open} />
              <LibraryFiles wide={wide} />
            </>
          }
        />
      </EditorGate>
    </Screen>
  );
}

const styles = StyleSheet.create({
  title: { gap: 2 },
});
