import { StyleSheet, View } from 'react-native';
import { healthCheckNames, type HealthCheckName, type HealthResponse } from '@/shared/api/health';
import { formatDateTime } from '@/components/format/date';
import { colors, radii, spacing } from '@/components/theme';
import { Glyph } from '@/components/ui/glyph';
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

export function HealthReport({ health, checkedAt }: HealthReportProps) {
  const ok = health.status === 'ok';
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
            {`version ${health.version} · checked ${formatDateTime(new Date(checkedAt).toISOString())}`}
          </AppText>
        </View>
      </View>
      <View style={styles.list} role="list" aria-label="Health checks">
        {healthCheckNames.flatMap((name) => {
          const check = health.checks[name];
          return check ? [{ name, check }] : [];
        }).map(({ name, check }, index) => (
          <View key={name} style={index > 0 ? styles.divided : undefined}>
            <CheckRow label={checkLabels[name]} check={check} />
          </View>
        ))}
      </View>
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
