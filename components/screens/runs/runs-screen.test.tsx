import { Text } from 'react-native';
import { act, within, fireEvent, screen, waitFor } from 'expo-router/testing-library';
import { lastSocket, sockets } from '@/components/realtime/test-socket';
import { renderRoutes } from '@/components/test-router';
import { sessionAs } from '@/components/test-utils';
import { progress, routeFetch, runSummary } from './test-fixtures';
import { RunsScreen } from './runs-screen';

jest.mock('socket.io-client', () => jest.requireActual('@/components/realtime/test-socket'));

const routes = { 'runs/index': RunsScreen, 'runs/compare': () => <Text>Compare page</Text>, 'runs/[id]': () => <Text>Run page</Text> };

const id = (n: number) => `3333333${n}-3333-4333-8333-333333333333`;
const runs = [
  runSummary('running', { id: id(1), fractionDone: 0.2 }),
  runSummary('succeeded', { id: id(2), number: 12, best: 87.27, starts: 150, createdAt: '2026-12-04T14:05:00.000Z', launchedBy: 'Greta' }),
  runSummary('cancelled', { id: id(3), number: 11, best: 85.1, starts: 3, createdAt: '2026-12-04T09:30:00.000Z' }),
  runSummary('failed', { id: id(4) }),
  runSummary('queued', { id: id(5), waiting: { position: 1, reason: 'Your team already has 4 runs running, the most one team may run at once (4); it starts when one of them ends.' } }),
];

afterEach(() => {
  sockets.length = 0;
});

describe('RunsScreen', () => {
  it('lists runs with state in words and live progress of the running ones', async () => {
    routeFetch({ 'GET /api/runs': { status: 200, body: { runs } } });
    renderRoutes(routes, '/runs', sessionAs('viewer'));
    expect(await screen.findByTestId(`run-row-${id(2)}`)).toHaveTextContent(/Succeeded.*Best ΔT 87\.27\sK/);
    expect(screen.getByTestId(`run-row-${id(4)}`)).toHaveTextContent(/Failed.*no current gives a steady state/);
    // Two runs of one design read apart: number, launch date and time, starts, who launched it.
    expect(within(screen.getByTestId(`run-row-${id(2)}`)).getByTestId('run-row-name')).toHaveTextContent('Run 12 · Detector p-leg');
    expect(within(screen.getByTestId(`run-row-${id(2)}`)).getByTestId('run-row-provenance')).toHaveTextContent('4 Dec 2026, 14:05 UTC · 150 starts · Greta');
    expect(within(screen.getByTestId(`run-row-${id(3)}`)).getByTestId('run-row-provenance')).toHaveTextContent('4 Dec 2026, 09:30 UTC · 3 starts · Piet');
    // A waiting run says where it stands and why, as the server worked it out.
    expect(screen.getByTestId(`run-row-${id(5)}`)).toHaveTextContent(/Queued.*waiting: next in line.*the most one team may run at once \(4\)/);
    act(() => lastSocket().serverConnect());
    expect(lastSocket().watched()).toEqual([`run:${id(1)}`, `run:${id(5)}`]);
    act(() => lastSocket().serverEmit('run:progress', progress({ runId: id(1), fractionDone: 0.55, best: 86 })));
    expect(screen.getByTestId(`run-row-${id(1)}`)).toHaveTextContent(/Running.*Best so far ΔT 86\sK.*55 %/);
  });

  it('compares only finished runs with a result, two to four of them', async () => {
    routeFetch({ 'GET /api/runs': { status: 200, body: { runs } } });
    const result = renderRoutes(routes, '/runs', sessionAs('viewer'));
    await screen.findByTestId(`run-row-${id(2)}`);
    expect(screen.queryByTestId(`compare-${id(1)}`)).toBeNull();
    expect(screen.queryByTestId(`compare-${id(4)}`)).toBeNull();
    fireEvent.press(screen.getByTestId(`compare-${id(2)}`));
    expect(screen.queryByTestId('compare-link')).toBeNull();
    fireEvent.press(screen.getByTestId(`compare-${id(3)}`));
    await act(async () => fireEvent.press(screen.getByTestId('compare-link')));
    await waitFor(() => expect(result.getPathname()).toBe('/runs/compare'));
    expect(result.getSearchParams()).toEqual({ ids: `${id(2)},${id(3)}` });
  });
});
