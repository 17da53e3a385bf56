import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { parseMeasurementsCsv, type MeasurementPreview as Preview } from '@/shared/growth/parse-measurements';
import { hallFactorSchema } from '@/shared/api/growth';
import type { UploadIssue } from '@/shared/api/family-upload';
import { ApiError } from '@/components/api/client';
import { useUploadMeasurements } from '@/components/api/growth';
import type { PickedFile } from '@/components/api/picked-file';
import { spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { IssueList } from '../materials/upload/issue-list';
import { megabytes, useCsvPicker } from '../materials/upload/use-csv-picker';
import { ErrorNotice } from './error-notice';
import { MeasurementFormatHelp } from './measurement-format-help';
import { MeasurementPreview } from './measurement-preview';
import { readPickedText } from './read-picked-text';
import { wordIssue } from '@/shared/api/field-labels';

/** "file:line 12:seebeck_uV_per_K" (the API's field of a CSV problem) as a located issue. */
export function issueFromField(field: string, message: string): UploadIssue {
  const [, ...parts] = field.split(':');
  const line = parts.find((p) => /^line \d+$/.test(p));
  const column = parts.find((p) => !/^line \d+$/.test(p));
  return { line: line ? Number(line.slice(5)) : undefined, column, message };
}

export type MeasurementUploadProps = { orderId: string; lengthMm: number; measureTemperature: number; onSaved?: () => void };

type Chosen = { file: PickedFile; preview: Preview };

/**
 * Choose a CSV of as-grown measurements, see at once what was read (the
 * shared reader runs in the browser, errors by line and column), then
 * upload it; the server reads it again and saves all of it or nothing.
 */
export function MeasurementUpload({ orderId, lengthMm, measureTemperature, onSaved }: MeasurementUploadProps) {
  const { pick, picking } = useCsvPicker();
  const upload = useUploadMeasurements(orderId);
  const [chosen, setChosen] = useState<Chosen | null>(null);
  const [refused, setRefused] = useState<string | null>(null);
  const [temperature, setTemperature] = useState(String(measureTemperature));
  // Empty: the band model's Hall factor (1 for a measured-table family); a number overrides it.
  const [hallFactor, setHallFactor] = useState('');
  const choose = async () => {
    const result = await pick();
    if (!result) return;
    upload.reset();
    if ('tooLarge' in result) {
      setChosen(null);
      setRefused(`${result.tooLarge.name} is ${megabytes(result.tooLarge.size ?? 0)}: too large for a measurement file.`);
      return;
    }
    try {
      const text = await readPickedText(result.file);
      setRefused(null);
      setChosen({ file: result.file, preview: parseMeasurementsCsv(text, lengthMm) });
    } catch (err) {
      setChosen(null);
      setRefused(`${result.file.name} could not be read: ${err instanceof Error ? err.message : String(err)}`);
    }
  };
  const t = Number(temperature);
  const temperatureError = temperature.trim() === '' || !(t >= 200 && t <= 400) ? 'Give the measurement temperature in kelvin (200–400 K).' : undefined;
  const hall = hallFactor.trim() === '' ? null : hallFactorSchema.safeParse(hallFactor.trim());
  const serverHallError = upload.error instanceof ApiError ? upload.error.fieldErrors.find((e) => e.field === 'hallFactor')?.message : undefined;
  const hallIssue = hall && !hall.success ? hall.error.issues[0] : undefined;
  const hallError = hallIssue ? wordIssue(hallIssue, 'hallFactor') : serverHallError;
  const hasHall = chosen?.preview.points.some((q) => q.perCm3 !== undefined) ?? false;
  const save = () => {
    if (!chosen || temperatureError || (hall && !hall.success)) return;
    upload.mutate({ file: chosen.file, temperature: t, hallFactor: hall?.success ? hall.data : undefined }, { onSuccess: () => { setChosen(null); setHallFactor(''); onSaved?.(); } });
  };
  const serverIssues = upload.error instanceof ApiError ? upload.error.fieldErrors.filter((e) => e.field.startsWith('file')).map((e) => issueFromField(e.field, e.message)) : [];
  return (
    <View style={styles.wrap} testID="measurement-upload">
      {chosen ? null : <MeasurementFormatHelp />}
      <View style={styles.row}>
        <Button label={picking ? 'Choosing…' : chosen ? 'Choose another file' : 'Choose CSV file'} onPress={() => void choose()} disabled={picking || upload.isPending} />
        {chosen ? <AppText variant="mono" tone="muted" testID="chosen-measurements">{chosen.file.name}</AppText> : null}
      </View>
      {refused ? <Notice tone="danger" title="File refused"><AppText>{refused}</AppText></Notice> : null}
      {chosen ? <MeasurementPreview preview={chosen.preview} /> : null}
      {chosen?.preview.ok ? (
        <View style={styles.save}>
          <TextField id="measure-temperature" label="Measured at" unit="K" mono keyboardType="decimal-pad" help="Used for rows without a temperature_K column." value={temperature} onChangeText={setTemperature} error={temperatureError} />
          {hasHall ? (
            <TextField id="hall-factor" label="Hall factor r_H (optional)" mono keyboardType="decimal-pad" help="Leave empty for the band model's factor at each point (1 for a measured-table family). Carrier concentration = r_H × Hall concentration." value={hallFactor} onChangeText={setHallFactor} error={hallError} />
          ) : null}
          <Button label={upload.isPending ? 'Uploading…' : 'Upload measurements'} onPress={save} disabled={upload.isPending || temperatureError !== undefined || hallError !== undefined} />
        </View>
      ) : null}
      {serverIssues.length > 0 ? <IssueList kind="error" issues={serverIssues} /> : null}
      {upload.error && serverIssues.length === 0 && !serverHallError ? <ErrorNotice title="Not uploaded" error={upload.error} /> : null}
      {upload.isSuccess ? (
        <Notice tone="ok" title="Measurements saved" testID="measurements-saved">
          <AppText>The report below predicts the as-grown leg and checks each zone; the physicist has been e-mailed.</AppText>
        </Notice>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.md },
  save: { gap: spacing.md, maxWidth: 420 },
});
