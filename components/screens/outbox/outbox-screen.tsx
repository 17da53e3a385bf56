import { StyleSheet, View } from 'react-native';
import { ApiError } from '@/components/api/client';
import { useOutbox } from '@/components/api/outbox';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { spacing } from '@/components/theme';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/state-views';
import { MessageRow } from './message-row';

function isUnavailable(error: Error | null): boolean {
  return error instanceof ApiError && error.isNotFound;
}

/** E-mail the local mail catcher captured; development and test only. */
export function OutboxScreen() {
  const query = useOutbox();
  const refresh = () => void query.refetch();
  const unavailable = isUnavailable(query.error);
  return (
    <ScreenFrame
      title="Outbox"
      subtitle="E-mail the app has sent, captured locally instead of delivered"
      refreshing={query.isRefetching}
      onRefresh={refresh}
    >
      {query.isPending ? <LoadingState label="Loading captured e-mail…" /> : null}
      {unavailable ? (
        <EmptyState
          title="Outbox not available"
          body="The outbox is only available in development."
        />
      ) : null}
      {query.isError && !unavailable ? (
        <ErrorState
          title="Could not load the outbox"
          message={query.error.message}
          onRetry={refresh}
          retrying={query.isFetching}
        />
      ) : null}
      {query.data && query.data.length === 0 ? (
        <EmptyState
          title="No e-mail yet"
          body="Messages about finished runs, releases and measurements will appear here."
        />
      ) : null}
      {query.data && query.data.length > 0 ? (
        <View style={styles.list} role="list" aria-label="Captured e-mail">
          {query.data.map((message) => (
            <MessageRow key={message.id} message={message} />
          ))}
        </View>
      ) : null}
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.md },
});
