import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import type { UploadPreview as Preview } from '@/shared/api/family-upload';
import type { MaterialInput } from '@/shared/engine';
import { spacing } from '@/components/theme';
import { BlockHeading } from '@/components/ui/block-heading';
import { Section } from '@/components/ui/form-section';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';
import { carrierLabel } from '../family-labels';
import { FamilyPlots } from '../plots/family-plots';
import { ColumnTable } from './column-table';
import { CoverageGrid } from './coverage-grid';
import { IssueList } from './issue-list';
import { RowsTable } from './rows-table';

function Status({ preview }: { preview: Preview }) {
  if (!preview.ok) {
    const count = preview.errors.length;
    return (
      <Notice tone="danger" title="This file cannot be saved" testID="preview-status">
        <AppText>
          {`${count} ${count === 1 ? 'error' : 'errors'} below, each with its line and column. Fix the file and choose it again.`}
        </AppText>
      </Notice>
    );
  }
  const { dopings, temperatures } = preview.coverage;
  const carrier = preview.carrier ? ` · ${carrierLabel(preview.carrier).text}` : '';
  return (
    <Notice tone="ok" title="Ready to save" testID="preview-status">
      <AppText>
        {`${preview.rowCount} rows on ${dopings.length} dopings × ${temperatures.length} temperatures${carrier}.`}
        {preview.warnings.length > 0 ? ' Read the warnings before saving.' : ''}
      </AppText>
    </Notice>
  );
}

/** What the server read from the file; nothing is saved yet. */
export function UploadPreview({ preview }: { preview: Preview }) {
  const definition = useMemo<MaterialInput>(
    () => ({ kind: 'table', rows: preview.rows.map(({ perCm3, temperature, seebeck, sigma, kappa }) => ({ perCm3, temperature, seebeck, sigma, kappa })) }),
    [preview.rows],
  );
  return (
    <View style={styles.preview} testID="upload-preview">
      <Status preview={preview} />
      <IssueList kind="error" issues={preview.errors} />
      <IssueList kind="warning" issues={preview.warnings} />
      <Section title="Columns recognised" hint="Header, quantity, unit and the conversion applied.">
        <ColumnTable columns={preview.columns} />
      </Section>
      <Section title="Grid coverage" hint="Which doping × temperature points the file holds.">
        <CoverageGrid coverage={preview.coverage} />
      </Section>
      {preview.rows.length > 0 ? (
        <View style={styles.block}>
          <BlockHeading title="Plots of the parsed rows" hint="Measured points as markers, the interpolation between them as lines." />
          <FamilyPlots definition={definition} quantities={['seebeck', 'zT']} showOptimum={false} />
        </View>
      ) : null}
      <Section title="Parsed rows" hint="Converted back to the units of the trade.">
        <RowsTable rows={preview.rows} rowCount={preview.rowCount} />
      </Section>
    </View>
  );
}

const styles = StyleSheet.create({
  preview: { gap: spacing.lg },
  block: { gap: spacing.md },
});
