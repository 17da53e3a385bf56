import { StyleSheet, View } from 'react-native';
import { auditCsvUrl, useAuditTrail } from '@/components/api/audit';
import { useRole } from '@/components/auth/session';
import { FormAlert } from '@/components/auth/form/form-alert';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { useIsWide } from '@/components/shell/use-is-wide';
import { colors, radii, spacing } from '@/components/theme';
import { DownloadLink } from '@/components/ui/download-link';
import { RowButton } from '@/components/ui/row-button';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/state-views';
import { AuditRow } from './audit-row';

/**
 * `/team/audit` (admins): who signed in (and who failed), changed roles,
 * invited, removed, released, deleted and exported — when, and from which
 * network address — newest first, older pages on demand; CSV export.
 */
export function AuditScreen() {
  const { can } = useRole();
  const wide = useIsWide();
  const allowed = can('audit.read');
  const query = useAuditTrail(allowed);
  const refresh = () => void query.refetch();
  const events = query.data?.pages.flatMap((p) => p.events) ?? [];
  return (
    <ScreenFrame
      title="Audit trail"
      subtitle="Sign-ins, membership, releases, deletions and exports of your team"
      back={{ label: 'Team', href: '/team' }}
      accessory={allowed ? <DownloadLink label="Export CSV" url={auditCsvUrl()} testID="audit-csv" /> : undefined}
      refreshing={query.isRefetching}
      onRefresh={refresh}
    >
      {!allowed ? (
        <FormAlert tone="info" title="Admins only" testID="audit-admins-only">
          The audit trail is for the team&apos;s admins.
        </FormAlert>
      ) : null}
      {allowed && query.isPending ? <LoadingState label="Loading the audit trail…" /> : null}
      {allowed && query.isError ? (
        <ErrorState title="Could not load the audit trail" message={query.error.message} onRetry={refresh} retrying={query.isFetching} />
      ) : null}
      {allowed && query.data && events.length === 0 ? <EmptyState title="Nothing recorded yet" body="Sign-ins and changes to the team will appear here." /> : null}
      {allowed && events.length > 0 ? (
        <View style={styles.list} role="list" aria-label="Audit events" testID="audit-list">
          {events.map((event) => (
            <AuditRow key={event.id} event={event} wide={wide} />
          ))}
        </View>
      ) : null}
      {allowed && query.hasNextPage ? (
        <View style={styles.more}>
          <RowButton
            label={query.isFetchingNextPage ? 'Loading…' : 'Show older events'}
            onPress={() => void query.fetchNextPage()}
            disabled={query.isFetchingNextPage}
            testID="audit-older"
          />
        </View>
      ) : null}
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  list: {
    backgroundColor: colors.surface,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.border,
    paddingHorizontal: spacing.lg,
  },
  more: { flexDirection: 'row' },
});
