import { useHealth } from '@/components/api/health';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { Button } from '@/components/ui/button';
import { ErrorState, LoadingState } from '@/components/ui/state-views';
import { ChartCheck } from './chart-check';
import { HealthReport } from './health-report';

/** Health of the API; what it depends on (database, queue, workers, mail) for those the server shows it to. */
export function SystemScreen() {
  const query = useHealth();
  const refresh = () => void query.refetch();
  return (
    <ScreenFrame
      title="System"
      subtitle="Is everything Frostgrade depends on up?"
      accessory={
        <Button label="Check now" variant="quiet" onPress={refresh} disabled={query.isFetching} />
      }
    >
      {query.isPending ? <LoadingState label="Checking the server…" /> : null}
      {query.isError ? (
        <ErrorState
          title="Could not reach the health check"
          message={query.error.message}
          onRetry={refresh}
          retrying={query.isFetching}
        />
      ) : null}
      {query.data ? <HealthReport health={query.data} checkedAt={query.dataUpdatedAt} /> : null}
      <ChartCheck />
    </ScreenFrame>
  );
}
