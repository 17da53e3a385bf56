import { StyleSheet, View } from 'react-native';
import type { UploadIssue } from '@/shared/api/family-upload';
import { colors, radii, spacing } from '@/components/theme';
import { Glyph } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';

const shownAtMost = 40;

/** "Line 3, column seebeck_uV_per_K" — where to look in the file. */
export function issuePlace(issue: UploadIssue): string {
  const parts = [issue.line !== undefined ? `Line ${issue.line}` : 'Whole file'];
  if (issue.column) parts.push(`column ${issue.column}`);
  return parts.join(', ');
}

export type IssueListProps = { kind: 'error' | 'warning'; issues: UploadIssue[] };

/** Errors (the file cannot be saved) or warnings (it can, but look), each located. */
export function IssueList({ kind, issues }: IssueListProps) {
  if (issues.length === 0) return null;
  const error = kind === 'error';
  const color = error ? colors.danger : colors.heat;
  const title = `${issues.length} ${error ? (issues.length === 1 ? 'error' : 'errors') : issues.length === 1 ? 'warning' : 'warnings'}`;
  return (
    <View style={[styles.box, error ? styles.errorBox : styles.warningBox]} role={error ? 'alert' : 'note'} testID={`upload-${kind}s`}>
      <View style={styles.titleRow}>
        <Glyph name={error ? 'cross' : 'bang'} color={color} />
        <AppText variant="label" style={{ color }}>
          {title}
        </AppText>
      </View>
      <View role="list" style={styles.list}>
        {issues.slice(0, shownAtMost).map((issue, i) => (
          <View key={i} role="listitem" style={styles.item}>
            <AppText variant="monoStrong" tone="muted">
              {issuePlace(issue)}
            </AppText>
            <AppText>{issue.message}</AppText>
          </View>
        ))}
      </View>
      {issues.length > shownAtMost ? (
        <AppText variant="caption" tone="muted">{`…and ${issues.length - shownAtMost} more.`}</AppText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderRadius: radii.md, borderWidth: 1, padding: spacing.md, gap: spacing.sm },
  errorBox: { backgroundColor: colors.dangerSoft, borderColor: colors.danger },
  warningBox: { backgroundColor: colors.heatSoft, borderColor: colors.heat },
  titleRow: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  list: { gap: spacing.sm },
  item: { gap: spacing.xxs },
});
