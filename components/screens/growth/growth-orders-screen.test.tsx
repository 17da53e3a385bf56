import { Text } from 'react-native';
import { act, fireEvent, screen, within } from 'expo-router/testing-library';
import { renderRoutes } from '@/components/test-router';
import { sessionAs } from '@/components/test-utils';
import { GrowthOrdersScreen } from './growth-orders-screen';
import { order, routeFetch } from './test-fixtures';

jest.mock('socket.io-client', () => jest.requireActual('@/components/realtime/test-socket'));

const routes = { 'growth/index': GrowthOrdersScreen, 'growth/[id]': () => <Text>Order page</Text> };

const open = order({ id: '66666666-6666-4666-8666-000000000001', batch: 'NL-OPEN-1', state: 'growing', sheetStatus: 'computing' });
const closed = order({ id: '66666666-6666-4666-8666-000000000002', batch: 'NL-DONE-1', state: 'approved', closeReason: 'Within every band.' });

describe('GrowthOrdersScreen', () => {
  it('lists open orders with batch, design, state and sheet status in words, closed ones under their tab', async () => {
    routeFetch({ 'GET /api/growth-orders': { status: 200, body: { orders: [closed, open] } } });
    renderRoutes(routes, '/growth', sessionAs('grower'));
    const card = await screen.findByTestId(`order-card-${open.id}`);
    expect(card).toHaveTextContent(/NL-OPEN-1.*Detector p-leg.*Growing.*Sheet computing.*due 14 May 2027/);
    expect(screen.queryByTestId(`order-card-${closed.id}`)).toBeNull();
    await act(async () => fireEvent.press(screen.getByRole('tab', { name: 'Closed' })));
    expect(within(screen.getByTestId(`order-card-${closed.id}`)).getByTestId('order-state')).toHaveTextContent(/Approved/);
  });

  it('tells a physicist how to release when nothing is open, and a grower what to wait for', async () => {
    routeFetch({ 'GET /api/growth-orders': { status: 200, body: { orders: [] } } });
    renderRoutes(routes, '/growth', sessionAs('physicist'));
    expect(await screen.findByText(/Release a converged run from its page/)).toBeOnTheScreen();
  });

  it('tells a grower that released profiles will appear here', async () => {
    routeFetch({ 'GET /api/growth-orders': { status: 200, body: { orders: [] } } });
    renderRoutes(routes, '/growth', sessionAs('grower'));
    expect(await screen.findByText(/When a physicist releases a doping profile/)).toBeOnTheScreen();
  });
});
