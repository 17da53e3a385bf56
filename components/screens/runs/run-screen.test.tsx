import { Text } from 'react-native';
import { act, fireEvent, screen, waitFor, within } from 'expo-router/testing-library';
import type { RunDetail } from '@/shared/api/runs';
import { lastSocket, sockets } from '@/components/realtime/test-socket';
import { renderRoutes } from '@/components/test-router';
import { sessionAs } from '@/components/test-utils';
import { engineResult, ids, progress, routeFetch, runDetail, runSummary, type Reply } from './test-fixtures';
import { RunScreen } from './run-screen';

jest.mock('@/components/charts/series-plot', () => jest.requireActual('@/components/charts/test-series-plot'));
jest.mock('socket.io-client', () => jest.requireActual('@/components/realtime/test-socket'));

const routes = {
  'runs/[id]': RunScreen,
  'runs/index': () => <Text>Runs list</Text>,
  'designs/[id]/index': () => <Text>Design page</Text>,
};

const detailUrl = `GET /api/runs/${ids.run}`;
const ok = (body: unknown): Reply => ({ status: 200, body });

function show(detail: RunDetail | (() => RunDetail), role: 'physicist' | 'viewer' = 'physicist', extra: Record<string, Reply> = {}) {
  const fetched = routeFetch({ [detailUrl]: () => ok(typeof detail === 'function' ? detail() : detail), ...extra });
  renderRoutes(routes, `/runs/${ids.run}`, sessionAs(role));
  return fetched;
}

// The fixture's result is the engine's own optimisation, computed once; a busy machine needs time for it.
jest.setTimeout(30_000);
beforeAll(() => {
  engineResult();
}, 120_000);

afterEach(() => {
  sockets.length = 0;
});

describe('RunScreen', () => {
  it('shows a queued run in words, a bar at 0 % and a cancel button for a physicist', async () => {
    show(runDetail('queued'));
    expect(await screen.findByTestId('run-state')).toHaveTextContent(/Queued.*waiting for a worker/);
    const bar = screen.getByTestId('run-progress');
    expect(bar.props['aria-valuenow']).toBe(0);
    // Its place in line and the server's reason for the wait, in words.
    expect(screen.getByText(/number 2 in line/)).toBeOnTheScreen();
    expect(screen.getByTestId('run-waiting')).toHaveTextContent(/1 run ahead of it in the queue/);
    expect(screen.getByRole('button', { name: 'Cancel run' })).toBeOnTheScreen();
    // Watching the run's own room once connected.
    act(() => lastSocket().serverConnect());
    expect(lastSocket().watched()).toEqual([`run:${ids.run}`]);
    expect(screen.getByTestId('connection-live')).toBeOnTheScreen();
  });

  it('refetches once it watches the run: a start missed while the page loaded is not missed', async () => {
    let detail = runDetail('queued');
    show(() => detail);
    expect(await screen.findByTestId('run-state')).toHaveTextContent(/Queued/);
    // The worker claimed the run before the socket joined its room: no event will say so.
    detail = runDetail('running', { progress: progress({ fractionDone: 0.1 }) });
    act(() => lastSocket().serverConnect());
    await waitFor(() => expect(screen.getByTestId('run-state')).toHaveTextContent(/Running/));
    expect(screen.getByTestId('run-progress').props['aria-valuenow']).toBe(10);
  });

  it('hides cancel from a viewer', async () => {
    show(runDetail('running', { progress: progress() }), 'viewer');
    await screen.findByTestId('run-progress');
    expect(screen.queryByRole('button', { name: 'Cancel run' })).toBeNull();
  });

  it('moves the bar and the charts with live progress events', async () => {
    show(runDetail('running', { progress: progress({ fractionDone: 0.25 }) }));
    expect((await screen.findByTestId('run-progress')).props['aria-valuenow']).toBe(25);
    act(() => lastSocket().serverConnect());
    act(() => lastSocket().serverEmit('run:progress', progress({ fractionDone: 0.6, best: 86.5, elapsedSeconds: 9, phase: 'profile · start 10 of 16' })));
    expect(screen.getByTestId('run-progress').props['aria-valuenow']).toBe(60);
    expect(screen.getByTestId('best-so-far')).toHaveTextContent(/86\.5\sK/);
    expect(screen.getByText(/start 10 of 16 · 9\.0 s elapsed/)).toBeOnTheScreen();
    expect(within(screen.getByTestId('live-objective')).getByTestId('series-plot')).toHaveTextContent(/Best so far:1 Point being tried:0\+1/);
    expect(within(screen.getByTestId('live-doping')).getByTestId('series-plot')).toHaveTextContent(/Current profile:4\+4/);
    // Another run's events are not this run's.
    act(() => lastSocket().serverEmit('run:progress', progress({ runId: '99999999-9999-4999-8999-999999999999', fractionDone: 0.9 })));
    expect(screen.getByTestId('run-progress').props['aria-valuenow']).toBe(60);
  });

  it('puts the best beside its own current and the start being searched beside its own', async () => {
    show(runDetail('running', { progress: progress() }));
    const best = await screen.findByTestId('best-so-far');
    // The fixture's best (84.25 K) was found at 3.86 A in an earlier start; start 3 is at 2.79 A with 80.5 K.
    expect(best).toHaveTextContent(/Best ΔT so far over all starts.*84\.25\sK/);
    expect(screen.getByTestId('best-current')).toHaveTextContent(/^at 3\.86\sA$/);
    expect(screen.getByTestId('start-progress')).toHaveTextContent(/^Start 3 of 16, searching: best ΔT of this start 80\.5\sK at 2\.79\sA$/);
    expect(best).not.toHaveTextContent(/84\.25\sK\s*at 2\.79/);
    // Progress stored before the current was reported names no current rather than a wrong one.
    act(() => lastSocket().serverConnect());
    act(() => lastSocket().serverEmit('run:progress', { ...progress(), bestCurrent: undefined, start: undefined }));
    expect(screen.queryByTestId('best-current')).toBeNull();
    expect(screen.queryByTestId('start-progress')).toBeNull();
  });

  it('names the run by its team number, with its starts, in the heading (the tab title is checked in the browser, tests/e2e/titles.e2e.ts)', async () => {
    show(runDetail('succeeded', { result: true }));
    expect(await screen.findByRole('heading', { name: 'Run 7 · Detector p-leg' })).toBeOnTheScreen();
    expect(screen.getByText(/16 starts · launched 1 Feb 2026, 10:00 UTC by Piet/)).toBeOnTheScreen();
  });

  it('loads the stored result when the worker reports the run finished', async () => {
    let detail = runDetail('running', { progress: progress() });
    show(() => detail);
    await screen.findByTestId('run-progress');
    act(() => lastSocket().serverConnect());
    detail = runDetail('succeeded', { result: true });
    act(() => lastSocket().serverEmit('run:state', { runId: ids.run, state: 'succeeded', error: null }));
    expect(await screen.findByTestId('headline-numbers', {}, { timeout: 10_000 })).toBeOnTheScreen();
    expect(screen.queryByTestId('run-progress')).toBeNull();
    // Finished: the socket is closed and its listeners removed.
    await waitFor(() => expect(sockets[0]?.disconnected).toBe(true));
    expect(sockets[0]?.listenerCount()).toBe(0);
  });

  it('shows a succeeded run: numbers with units, gains, caution, plots with baselines, table, provenance, exports', async () => {
    const detail = runDetail('succeeded', { result: true });
    const result = detail.result as { deltaT: number; current: number; baselines: { uniform: { objective: number } } };
    show(detail);
    expect(await screen.findByTestId('run-state')).toHaveTextContent(/Succeeded/);
    expect(screen.getByTestId('headline-deltaT')).toHaveTextContent(new RegExp(`objective.*${String(Number(result.deltaT.toPrecision(4))).replace('.', '\\.')}\\sK`));
    expect(screen.getByTestId('headline-current')).toHaveTextContent(/\sA$/);
    expect(screen.getByTestId('headline-voltage')).toHaveTextContent(/\sV$/);
    expect(screen.getByTestId('caution')).toHaveTextContent(/Model prediction.*measure.*hot side can burn.*safety rules.*local electrical codes/);
    const gain = result.deltaT - result.baselines.uniform.objective;
    expect(gain).toBeGreaterThan(0);
    expect(screen.getByTestId('gain-uniform')).toHaveTextContent(new RegExp(`^\\+${String(Number(gain.toPrecision(4))).replace('.', '\\.')}\\sK.*best uniform leg`));
    expect(screen.getByTestId('gain-localBestZt')).toHaveTextContent(/local-best-zT leg/);
    // Baselines overlaid on every plot along the leg (solved in the browser for S, σ, κ, zT and T).
    for (const q of ['doping', 'temperature', 'seebeck', 'sigma', 'kappa', 'zT']) {
      expect(within(screen.getByTestId(`leg-plot-${q}`)).getByTestId('series-plot')).toHaveTextContent(/Graded optimum:\d+.*Best uniform:\d+\+[2-6].*Local-best zT:\d+\+[2-6]/);
    }
    expect(within(screen.getByTestId('leg-plot-temperature')).getByTestId('series-plot')).toHaveTextContent(/T \(K\) vs Position from the cold end x \(mm\)/);
    expect(screen.getByTestId('profile-table')).toHaveTextContent(/cm⁻³.*µV\/K.*S\/cm.*W\/\(m·K\)/);
    expect(screen.getByTestId('run-fact-engine')).toHaveTextContent(/0\.1\.0-test/);
    expect(screen.getByTestId('run-fact-accuracy')).toHaveTextContent(/relative error .* × 10⁻/);
    expect(screen.getByTestId('run-fact-time')).toHaveTextContent(/12\.5 s from start to finish/);
    expect(screen.getByTestId('run-fact-search')).toHaveTextContent(/16 of 16 starts done; the best came from start 4/);
    expect(screen.getByText('Export CSV')).toBeOnTheScreen();
    expect(screen.getByText('Export JSON')).toBeOnTheScreen();
    expect(sockets).toHaveLength(0);
  });

  it('shows why a run failed and no result', async () => {
    show(runDetail('failed'));
    expect(await screen.findByTestId('run-failed')).toHaveTextContent(/no current gives a steady state/);
    expect(screen.getByTestId('run-state')).toHaveTextContent(/Failed.*stopped with an error/);
    expect(screen.queryByTestId('headline-numbers')).toBeNull();
    expect(screen.queryByText('Export CSV')).toBeNull();
  });

  it('shows a cancelled run with the best result found before it stopped', async () => {
    show(runDetail('cancelled', { result: true }));
    expect(await screen.findByTestId('run-cancelled')).toHaveTextContent(/best result found before it stopped/);
    expect(screen.getByRole('heading', { name: 'Best result before cancelling' })).toBeOnTheScreen();
    expect(screen.getByTestId('run-state')).toHaveTextContent(/Cancelled/);
    expect(screen.getByTestId('headline-numbers')).toBeOnTheScreen();
  });

  it('cancels after one confirmation', async () => {
    const { requests } = show(runDetail('running', { progress: progress() }), 'physicist', {
      [`POST /api/runs/${ids.run}/cancel`]: ok({ run: runSummary('running') }),
    });
    fireEvent.press(await screen.findByRole('button', { name: 'Cancel run' }));
    expect(requests.some((r) => r.method === 'POST')).toBe(false);
    fireEvent.press(screen.getByRole('button', { name: 'Stop the run' }));
    expect(await screen.findByTestId('cancel-requested')).toBeOnTheScreen();
    expect(requests.filter((r) => r.method === 'POST').map((r) => r.url)).toEqual([`/api/runs/${ids.run}/cancel`]);
  });

  it('says so when the run is not in the team', async () => {
    routeFetch({ [detailUrl]: { status: 404, body: { name: 'NotFound', message: 'No such run.' } } });
    renderRoutes(routes, `/runs/${ids.run}`, sessionAs('viewer'));
    expect(await screen.findByText('This run is not in your team')).toBeOnTheScreen();
  });
});
