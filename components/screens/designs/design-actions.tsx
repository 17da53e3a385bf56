import { StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import type { Design } from '@/shared/api/designs';
import { useFollowDesign } from '@/components/api/designs';
import { useLaunchRun } from '@/components/api/runs';
import { useRole } from '@/components/auth/session';
import { colors, spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Glyph } from '@/components/ui/glyph';
import { LinkButton } from '@/components/ui/link-button';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';

/** Launch, edit (roles that may) and follow (everyone who reads the design). */
export function DesignActions({ design }: { design: Design }) {
  const router = useRouter();
  const { can } = useRole();
  const launch = useLaunchRun();
  const follow = useFollowDesign();
  const error = launch.error ?? follow.error;
  return (
    <View style={styles.wrap}>
      <View style={styles.buttons}>
        {can('runs.launch') ? (
          <Button
            label={launch.isPending ? 'Launching…' : 'Launch run'}
            disabled={launch.isPending}
            onPress={() => launch.mutate(design.id, { onSuccess: ({ run }) => router.push(`/runs/${run.id}`) })}
          />
        ) : null}
        {can('designs.write') ? <LinkButton label="Edit" href={`/designs/${design.id}/edit`} variant="quiet" /> : null}
        <Button
          variant="quiet"
          label={follow.isPending ? 'Saving…' : design.following ? 'Unfollow' : 'Follow'}
          disabled={follow.isPending}
          onPress={() => follow.mutate({ id: design.id, follow: !design.following })}
        />
      </View>
      <View style={styles.followLine} testID="follow-state">
        <Glyph name={design.following ? 'check' : 'ring'} color={design.following ? colors.ok : colors.textFaint} />
        <AppText variant="caption" tone="muted" style={styles.grow}>
          {design.following
            ? 'You follow this design: you are e-mailed when its runs finish, fail or are cancelled.'
            : 'You do not follow this design: follow it to be e-mailed when its runs end.'}
        </AppText>
      </View>
      {error ? (
        <Notice tone="danger" title={launch.error ? 'Run not launched' : 'Not changed'}>
          <AppText>{error.message}</AppText>
        </Notice>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  followLine: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.xs },
  grow: { flex: 1 },
});
