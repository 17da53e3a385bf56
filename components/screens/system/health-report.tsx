import { StyleSheet, View } from 'react-native';
import { healthCheckNames, type HealthCheckName, type HealthChecks, type HealthResponse } from '@/shared/api/health';
import { formatDateTime } from '@/components/format/date';
import { colors, radii, spacing } from '@/components/theme';
import { Glyph } from '@/components/ui/glyph';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';
import { CheckRow } from './check-row';

const checkLabels: Record<HealthCheckName, string> = {
  database: 'Database',
  queue: 'Job queue',
  worker: 'Workers',
  mail: 'Mail',
  events: 'Live updates',
};

export type HealthReportProps = { health: HealthResponse; checkedAt: number };

/**
 * The server decides what a caller may see: admins (of any team) and the
 * local operator get every check, other members ok or degraded and the
 * version, strangers ok or degraded alone.
 */
export function HealthReport({ health, checkedAt }: HealthReportProps) {
  const ok = health.status === 'ok';
  const checked = `checked ${formatDateTime(new Date(checkedAt).toISOString())}`;
  return (
    <View style={styles.stack}>
      <View style={[styles.banner, ok ? styles.bannerOk : styles.bannerBad]} role="status">
        <View style={styles.glyph}>
          <Glyph name={ok ? 'check' : 'cross'} color={ok ? colors.ok : colors.danger} />
        </View>
        <View style={styles.bannerText}>
          <AppText variant="heading" tone={ok ? 'ok' : 'danger'}>
            {ok ? 'All systems working' : 'Degraded: some parts need attention'}
          </AppText>
          <AppText variant="mono" tone="muted">
            {health.version ? `version ${health.version} · ${checked}` : checked}
          </AppText>
        </View>
      </View>
      {'checks' in health ? (
        <CheckList checks={health.checks} />
      ) : (
        <Notice tone="info" title="Details are for admins" testID="health-details-hidden">
          <AppText>
            {"Admins see each part Frostgrade depends on (database, job queue, workers, mail, live updates) and what went wrong. If this says degraded, tell your team's admin."}
          </AppText>
        </Notice>
      )}
    </View>
  );
}

function CheckList({ checks }: { checks: HealthChecks }) {
  return (
    <View style={styles.list} role="list" aria-label="Health checks">
      {healthCheckNames.flatMap((name) => {
        const check = checks[name];
        return check ? [{ name, check }] : [];
      }).map(({ name, check }, index) => (
        <View key={name} style={index > 0 ? styles.divided : undefined}>
          <CheckRow label={checkLabels[name]} check={check} />
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: spacing.lg },
  banner: {
    flexDirection: 'row',
    alignItems: 'flex-start',
    gap: spacing.md,
    padding: spacing.lg,
    borderRadius: radii.lg,
    borderWidth: 1,
  },
  bannerOk: { backgroundColor: colors.okSoft, borderColor: colors.ok },
  bannerBad: { backgroundColor: colors.dangerSoft, borderColor: colors.danger },
  // Centres the 16-px glyph on the 24-px heading line.
  glyph: { marginTop: 4 },
  bannerText: { flex: 1, gap: spacing.xxs },
  list: {
    backgroundColor: colors.surface,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.border,
  },
  divided: { borderTopWidth: 1, borderTopColor: colors.border },
});
