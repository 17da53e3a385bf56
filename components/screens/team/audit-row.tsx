import { StyleSheet, View } from 'react-native';
import type { AuditEvent } from '@/shared/api/audit';
import { formatDateTime } from '@/components/format/date';
import { colors, spacing } from '@/components/theme';
import { Badge } from '@/components/ui/badge';
import { AppText } from '@/components/ui/text';
import { auditActionLabels, auditWarnings } from './audit-words';

/**
 * One event: when, what (tag and words), who, and from which network
 * address. A row of columns on a wide screen, stacked lines on a phone.
 */
export function AuditRow({ event, wide }: { event: AuditEvent; wide: boolean }) {
  const who = event.actor ?? (event.email ? `someone trying ${event.email}` : 'nobody signed in');
  const about = event.email && event.actor ? event.email : null;
  return (
    <View style={wide ? styles.wide : styles.stacked} role="listitem" testID={`audit-${event.id}`}>
      <AppText variant="mono" tone="muted" style={wide ? styles.when : undefined}>
        {formatDateTime(event.at)}
      </AppText>
      <View style={wide ? styles.what : styles.line}>
        <Badge label={auditActionLabels[event.action]} tone={auditWarnings.has(event.action) ? 'heat' : 'neutral'} />
        <AppText>
          <AppText variant="bodyStrong">{who}</AppText>
          {` ${event.summary}`}
        </AppText>
        {about ? (
          <AppText variant="caption" tone="muted">
            {about}
          </AppText>
        ) : null}
      </View>
      <AppText variant="mono" tone="faint" style={wide ? styles.from : undefined} accessibilityLabel={`from ${event.ip ?? 'an unknown address'}`}>
        {event.ip ?? '—'}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  stacked: { gap: spacing.xs, paddingVertical: spacing.md, borderBottomWidth: 1, borderBottomColor: colors.border },
  line: { gap: spacing.xs },
  wide: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.lg, paddingVertical: spacing.md, borderBottomWidth: 1, borderBottomColor: colors.border },
  when: { width: 190 },
  what: { flex: 1, gap: spacing.xs },
  from: { width: 150, textAlign: 'right' },
});
