import { useLocalSearchParams } from 'expo-router';
import type { GrowthOrderDetail } from '@/shared/api/growth';
import { ApiError } from '@/components/api/client';
import { useGrowthOrder } from '@/components/api/growth';
import { readSheet } from '@/shared/api/growth-documents';
import { useRole } from '@/components/auth/session';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { Section } from '@/components/ui/form-section';
import { Notice } from '@/components/ui/notice';
import { ErrorState, LoadingState } from '@/components/ui/state-views';
import { AppText } from '@/components/ui/text';
import { AdvanceOrder } from './advance-order';
import { CloseOrder } from './close-order';
import { GrowthSheetView } from './growth-sheet-view';
import { isClosed } from './growth-state';
import { MeasurementsSection } from './measurements-section';
import { dueText } from './order-card';
import { OrderOverview } from './order-overview';
import { OrderTimeline } from './order-timeline';
import { SheetSettings } from './sheet-settings';
import { useGrowthEvents } from './use-growth-events';

const back = { label: 'Growth', href: '/growth' } as const;

/** The sheet, or why there is none yet. */
function SheetBlock({ detail }: { detail: GrowthOrderDetail }) {
  const { order } = detail;
  const sheet = readSheet(detail.sheet);
  if (order.sheetStatus === 'computing') {
    const done = order.sheetProgress === null ? '' : ` ${Math.round(100 * order.sheetProgress)} %`;
    return <LoadingState label={`Computing the growth sheet${done}: zones, tolerance bands re-solved at their corners, room-temperature checks, the yield…`} />;
  }
  if (order.sheetStatus === 'failed' || !sheet) {
    return (
      <Notice tone="danger" title="The growth sheet could not be computed" testID="sheet-failed">
        <AppText>{order.sheetError ?? 'The stored sheet is not in a shape this version of Frostgrade understands.'}</AppText>
      </Notice>
    );
  }
  return <GrowthSheetView order={order} sheet={sheet} />;
}

function OrderPage({ detail }: { detail: GrowthOrderDetail }) {
  const { order } = detail;
  const { can } = useRole();
  const sheet = readSheet(detail.sheet);
  const measured = detail.measurements.length > 0;
  // Once the piece is measured its report is what physicists and readers decide on, so it comes
  // first; a grower keeps the sheet on top (the page does not jump under them after an upload).
  const reportFirst = measured && (can('profiles.release') || !can('measurements.upload'));
  const measurements = <MeasurementsSection detail={detail} sheet={sheet} />;
  return (
    <ScreenFrame
      title={`Batch ${order.batch}`}
      // Browsers name the tab, and a PDF printed from it, after the order.
      tabTitle={`Growth order ${order.batch}`}
      subtitle={`${order.designName} · ${dueText(order)} · released by ${order.releasedBy}`}
      back={back}
    >
      <OrderOverview order={order} />
      <AdvanceOrder orderId={order.id} state={order.state} sheetStatus={order.sheetStatus} measured={measured} />
      {reportFirst ? measurements : null}
      {reportFirst ? <CloseOrder orderId={order.id} state={order.state} /> : null}
      <SheetBlock detail={detail} />
      {can('profiles.release') && !isClosed(order.state) ? <SheetSettings key={`${order.zones}-${order.lossBudget}-${order.measureTemperature}`} order={order} maxZones={sheet?.steps.length ?? 12} /> : null}
      {reportFirst ? null : measurements}
      {reportFirst ? null : <CloseOrder orderId={order.id} state={order.state} />}
      <Section title="Timeline" hint="Every change, who made it and when (UTC).">
        <OrderTimeline events={detail.timeline} />
      </Section>
    </ScreenFrame>
  );
}

/** `/growth/[id]`: one growth order — state, sheet, measurements, verdict and timeline. */
export function GrowthOrderScreen() {
  const id = useLocalSearchParams<{ id: string }>().id ?? '';
  const query = useGrowthOrder(id);
  useGrowthEvents(id.length > 0);
  if (query.data) return <OrderPage detail={query.data} />;
  const notFound = query.error instanceof ApiError && query.error.isNotFound;
  return (
    <ScreenFrame title={notFound ? 'No such growth order' : 'Growth order'} back={back}>
      {query.isError ? (
        <ErrorState
          title={notFound ? 'This order is not in your team' : 'Could not load the growth order'}
          message={query.error.message}
          onRetry={notFound ? undefined : () => void query.refetch()}
          retrying={query.isFetching}
        />
      ) : (
        <LoadingState label="Loading the growth order…" />
      )}
    </ScreenFrame>
  );
}
