import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import type { InvitationPreview } from '@/shared/api/auth';
import { formatDay } from '@/components/format/date';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';
import { roleSummaries } from './permissions';
import { RoleBadge } from './role-badge';

/** One labelled line of a link's summary (team, role, address, expiry). */
export function SummaryLine({ label, children }: { label: string; children: ReactNode }) {
  return (
    <View style={styles.line}>
      <AppText variant="caption" tone="muted" style={styles.label}>
        {label}
      </AppText>
      <View style={styles.value}>{children}</View>
    </View>
  );
}

/** What a link will make, before the account exists: lines on a sunken card inside the form's card. */
export function SummaryCard({ children, testID }: { children: ReactNode; testID: string }) {
  return (
    <View style={styles.card} testID={testID}>
      {children}
    </View>
  );
}

/** Team, role, address and expiry of an invitation, before the account exists. */
export function InvitationSummary({ preview }: { preview: InvitationPreview }) {
  return (
    <SummaryCard testID="invitation-summary">
      <SummaryLine label="Team">
        <AppText variant="bodyStrong">{preview.teamName}</AppText>
      </SummaryLine>
      <SummaryLine label="Role">
        <RoleBadge role={preview.role} />
        <AppText variant="caption" tone="muted">
          {roleSummaries[preview.role]}
        </AppText>
      </SummaryLine>
      <SummaryLine label="E-mail">
        <AppText>{preview.email}</AppText>
      </SummaryLine>
      <SummaryLine label="Valid until">
        <AppText>{formatDay(preview.expiresAt)}</AppText>
      </SummaryLine>
    </SummaryCard>
  );
}

const styles = StyleSheet.create({
  // Sunken, not another bordered card: it sits inside the form's card.
  card: {
    backgroundColor: colors.surfaceSunken,
    borderRadius: radii.md,
    padding: spacing.md,
    gap: spacing.md,
  },
  line: { gap: spacing.xxs },
  label: { textTransform: 'uppercase', letterSpacing: 0.6 },
  value: { gap: spacing.xxs },
});
