import { Text } from 'react-native';
import { screen } from 'expo-router/testing-library';
import { renderRoutes } from '@/components/test-router';
import { sessionAs } from '@/components/test-utils';
import { routeFetch } from '@/components/screens/runs/test-fixtures';
import { RunScreen } from '@/components/screens/runs/run-screen';
import { coolerIds, coolerRunDetail } from './test-fixtures';

jest.mock('@/components/charts/series-plot', () => jest.requireActual('@/components/charts/test-series-plot'));
jest.mock('socket.io-client', () => jest.requireActual('@/components/realtime/test-socket'));

const routes = { 'runs/[id]': RunScreen, 'stages/[id]/index': () => <Text>Cooler page</Text> };
const empty = { status: 200, body: { runs: [] } };

describe('RunScreen with a cooler run', () => {
  it('shows a finished cascade run: caution, pyramid, stage table, CSV, a link to its cascade and no design', async () => {
    routeFetch({ [`GET /api/runs/${coolerIds.cascadeRun}`]: { status: 200, body: coolerRunDetail('cascade', 'succeeded') }, 'GET /api/runs': empty, 'GET /api/families': { status: 200, body: { families: [] } }, 'GET /api/designs': { status: 200, body: { designs: [] } } });
    renderRoutes(routes, `/runs/${coolerIds.cascadeRun}`, sessionAs('viewer'));
    expect(await screen.findByRole('heading', { name: 'Run 9 · Detector cascade, 3 stages' })).toBeOnTheScreen();
    expect(screen.getByTestId('cooler-caution')).toHaveTextContent(/Model prediction — measure before you build/);
    expect(screen.getByTestId('pyramid')).toBeOnTheScreen();
    expect(screen.getByTestId('stage-table')).toBeOnTheScreen();
    expect(screen.getByTestId('cascade-csv')).toBeOnTheScreen();
    expect(screen.getByTestId('run-cooler-link')).toHaveTextContent('Cascade: Detector cascade, 3 stages');
    expect(screen.getByTestId('fact-stage-1')).toHaveTextContent(/Stage 1 \(coldest\).*4 couples · .*interface 0\.5\sK\/W/);
    expect(screen.getByTestId('fact-search')).toHaveTextContent('Search4 of 4 starts done; the best came from start 2');
  });

  it('shows a queued couple run with its progress bar instead of a result', async () => {
    routeFetch({ [`GET /api/runs/${coolerIds.coupleRun}`]: { status: 200, body: coolerRunDetail('couple', 'queued') }, 'GET /api/runs': empty, 'GET /api/families': { status: 200, body: { families: [] } }, 'GET /api/designs': { status: 200, body: { designs: [] } } });
    renderRoutes(routes, `/runs/${coolerIds.coupleRun}`, sessionAs('physicist'));
    expect((await screen.findByTestId('run-progress')).props['aria-valuenow']).toBe(0);
    expect(screen.queryByTestId('couple-result')).toBeNull();
    expect(screen.getByRole('button', { name: 'Cancel run' })).toBeOnTheScreen();
  });
});
