import { Pressable, StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import type { FamilyDetailResponse } from '@/shared/api/families';
import { formatDateTime } from '@/components/format/date';
import { colors, radii, spacing } from '@/components/theme';
import { Badge } from '@/components/ui/badge';
import { Glyph } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';

type VersionEntry = FamilyDetailResponse['versions'][number];

export type VersionHistoryProps = {
  familyId: string;
  versions: VersionEntry[];
  /** The newest version number. */
  latest: number;
  /** The version this page shows. */
  viewing: number;
};

function usage(runCount: number): { locked: boolean; text: string } {
  if (runCount === 0) return { locked: false, text: 'Not used by any run yet' };
  return { locked: true, text: `Used by ${runCount} ${runCount === 1 ? 'run' : 'runs'} · locked` };
}

function VersionRow({ familyId, entry, latest, viewing }: { familyId: string; entry: VersionEntry; latest: number; viewing: number }) {
  const use = usage(entry.runCount);
  const href = entry.version === latest ? `/materials/${familyId}` : `/materials/${familyId}?version=${entry.version}`;
  const shown = entry.version === viewing;
  return (
    <Link href={href} asChild>
      <Pressable
        style={shown ? shownRow : styles.row}
        aria-current={shown ? 'page' : undefined}
        testID={`version-${entry.version}`}
      >
        <View style={styles.head}>
          <AppText variant="bodyStrong">{`Version ${entry.version}`}</AppText>
          {entry.version === latest ? <Badge label="Current" tone="cold" /> : null}
          {shown ? <Badge label="Shown" /> : null}
        </View>
        <AppText variant="caption" tone="muted">
          {`${formatDateTime(entry.createdAt)} by ${entry.createdBy}`}
        </AppText>
        {entry.source ? (
          <AppText variant="caption" numberOfLines={2}>
            {entry.source}
          </AppText>
        ) : null}
        <View style={styles.usage}>
          <Glyph name={use.locked ? 'lock' : 'ring'} color={use.locked ? colors.heat : colors.textFaint} />
          <AppText variant="label" tone={use.locked ? 'heat' : 'muted'}>
            {use.text}
          </AppText>
        </View>
      </Pressable>
    </Link>
  );
}

/** Every version, newest first; a version a run has used can never change. */
export function VersionHistory({ familyId, versions, latest, viewing }: VersionHistoryProps) {
  const newestFirst = [...versions].sort((a, b) => b.version - a.version);
  return (
    <View style={styles.list} role="list" aria-label="Versions">
      {newestFirst.map((entry) => (
        <View key={entry.version} role="listitem">
          <VersionRow familyId={familyId} entry={entry} latest={latest} viewing={viewing} />
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.sm },
  row: {
    gap: spacing.xxs,
    padding: spacing.md,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.border,
    backgroundColor: colors.background,
  },
  shown: { borderColor: colors.primary, backgroundColor: colors.primarySoft },
  head: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: spacing.sm },
  usage: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs, marginTop: spacing.xxs },
});

/** A child of Link needs one flat style object (Link spreads it into its own). */
const shownRow = StyleSheet.flatten([styles.row, styles.shown]);
