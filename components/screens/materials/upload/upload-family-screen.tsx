import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { maxUploadBytes } from '@/shared/api/family-upload';
import { ApiError } from '@/components/api/client';
import { usePreviewUpload, useSaveUpload, type PickedFile } from '@/components/api/family-upload';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { spacing } from '@/components/theme';
import { BlockHeading } from '@/components/ui/block-heading';
import { Button } from '@/components/ui/button';
import { Section } from '@/components/ui/form-section';
import { Notice } from '@/components/ui/notice';
import { LoadingState } from '@/components/ui/state-views';
import { AppText } from '@/components/ui/text';
import { FamilyWriteGuard } from '../write-guard';
import { CsvFormatHelp } from './csv-format-help';
import { SaveUploadForm } from './save-upload-form';
import { UploadPreview } from './upload-preview';
import { megabytes, useCsvPicker } from './use-csv-picker';

/** Choose a CSV, see what was read, then save it as a measured family (all or nothing). */
export function UploadFamilyScreen() {
  const router = useRouter();
  const { pick, picking } = useCsvPicker();
  const preview = usePreviewUpload();
  const save = useSaveUpload();
  const [file, setFile] = useState<PickedFile | null>(null);
  const [refused, setRefused] = useState<string | null>(null);

  const choose = async () => {
    const result = await pick();
    if (!result) return;
    save.reset();
    if ('tooLarge' in result) {
      setFile(null);
      preview.reset();
      setRefused(`${result.tooLarge.name} is ${megabytes(result.tooLarge.size ?? 0)}; the limit is ${megabytes(maxUploadBytes)}.`);
      return;
    }
    setRefused(null);
    setFile(result.file);
    preview.mutate(result.file);
  };

  return (
    <ScreenFrame
      title="Upload a measured table"
      subtitle="S, σ and κ measured on a doping × temperature grid, from a CSV file."
      back={{ label: 'Materials', href: '/materials' }}
    >
      <FamilyWriteGuard>
        <Section title="1 · Choose a CSV file">
          <CsvFormatHelp />
          <View style={styles.pickRow}>
            <Button label={picking ? 'Choosing…' : file ? 'Choose another file' : 'Choose CSV file'} onPress={() => void choose()} disabled={picking || preview.isPending} />
            {file ? (
              <AppText variant="mono" tone="muted" testID="chosen-file">
                {file.size !== undefined ? `${file.name} · ${(file.size / 1024).toFixed(1)} kB` : file.name}
              </AppText>
            ) : null}
          </View>
          {refused ? (
            <Notice tone="danger" title="File too large">
              <AppText>{refused}</AppText>
            </Notice>
          ) : null}
        </Section>
        {preview.isPending ? <LoadingState label="Reading the file…" /> : null}
        {preview.isError ? (
          <Notice tone="danger" title={preview.error instanceof ApiError && preview.error.isClientError ? 'File refused' : 'Could not read the file'}>
            <AppText>{preview.error.message}</AppText>
          </Notice>
        ) : null}
        {preview.data && file ? (
          <>
            <BlockHeading title="2 · Check what was read" hint="Nothing is saved yet." />
            <UploadPreview preview={preview.data} />
            <Section title="3 · Name and provenance">
              <SaveUploadForm
                canSave={preview.data.ok}
                pending={save.isPending}
                error={save.error}
                onSave={(texts) =>
                  save.mutate({ file, ...texts }, { onSuccess: ({ family }) => router.replace(`/materials/${family.id}`) })
                }
              />
            </Section>
          </>
        ) : null}
      </FamilyWriteGuard>
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  pickRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.md },
});
