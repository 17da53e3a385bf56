import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { Invitation } from '@/shared/api/auth';
import { useRevokeInvitation } from '@/components/api/team';
import { FormAlert } from '@/components/auth/form/form-alert';
import { errorsFrom } from '@/components/auth/form/form-errors';
import { RoleBadge } from '@/components/auth/role-badge';
import { formatDay } from '@/components/format/date';
import { colors, spacing } from '@/components/theme';
import { Glyph, type GlyphName } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';
import { ConfirmBox } from '@/components/ui/confirm-box';
import { RowButton } from '@/components/ui/row-button';

type State = Invitation['state'];

const stateLook: Record<State, { glyph: GlyphName; word: string; color: string }> = {
  pending: { glyph: 'ring', word: 'Pending', color: colors.primary },
  accepted: { glyph: 'check', word: 'Accepted', color: colors.ok },
  revoked: { glyph: 'cross', word: 'Revoked', color: colors.textMuted },
  expired: { glyph: 'minus', word: 'Expired', color: colors.heat },
};

/** The state with a sign and a word. */
function StateTag({ state }: { state: State }) {
  const look = stateLook[state];
  return (
    <View style={styles.state} testID="invitation-state">
      <Glyph name={look.glyph} color={look.color} />
      <AppText variant="label" style={{ color: look.color }}>
        {look.word}
      </AppText>
    </View>
  );
}

function when(invitation: Invitation): string {
  const by = `Invited by ${invitation.invitedBy} on ${formatDay(invitation.createdAt)}`;
  if (invitation.state === 'pending') return `${by} · link valid until ${formatDay(invitation.expiresAt)}`;
  if (invitation.state === 'expired') return `${by} · expired ${formatDay(invitation.expiresAt)}`;
  return by;
}

/** One invitation; admins may revoke a pending one (confirmed). */
export function InvitationRow({ invitation, manage }: { invitation: Invitation; manage: boolean }) {
  const [confirming, setConfirming] = useState(false);
  const revoke = useRevokeInvitation();
  const problem = revoke.isError ? errorsFrom(revoke.error, []).banner : null;
  const canRevoke = manage && invitation.state === 'pending';
  return (
    <View style={styles.row} role="listitem" aria-label={`Invitation to ${invitation.email}`} testID={`invitation-${invitation.email}`}>
      <View style={styles.main}>
        <AppText variant="bodyStrong">{invitation.email}</AppText>
        <View style={styles.tags}>
          <RoleBadge role={invitation.role} />
          <StateTag state={invitation.state} />
        </View>
        <AppText variant="caption" tone="faint">
          {when(invitation)}
        </AppText>
      </View>
      {canRevoke && !confirming ? (
        <View style={styles.actions}>
          <RowButton label="Revoke" accessibilityLabel={`Revoke the invitation to ${invitation.email}`} onPress={() => setConfirming(true)} testID="revoke" />
        </View>
      ) : null}
      {canRevoke && confirming ? (
        <ConfirmBox
          question={`Revoke the invitation to ${invitation.email}?`}
          consequence="The link in their e-mail stops working. You can invite the address again later."
          confirmLabel="Revoke invitation"
          busyLabel="Revoking…"
          busy={revoke.isPending}
          onConfirm={() => revoke.mutate(invitation.id)}
          onCancel={() => setConfirming(false)}
          testID="confirm-revoke"
        />
      ) : null}
      {problem ? (
        <FormAlert tone="danger" title="Not revoked">
          {problem}
        </FormAlert>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: spacing.md, paddingVertical: spacing.md, borderTopWidth: 1, borderTopColor: colors.border },
  main: { gap: spacing.xs },
  tags: { flexDirection: 'row', alignItems: 'center', gap: spacing.md },
  state: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  actions: { flexDirection: 'row', gap: spacing.sm },
});
