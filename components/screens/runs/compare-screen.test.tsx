import { act, fireEvent, screen, waitFor, within } from 'expo-router/testing-library';
import { renderRoutes } from '@/components/test-router';
import { sessionAs } from '@/components/test-utils';
import { moduleDesign, moduleSummary } from '@/components/screens/modules/module-fixtures';
import { ids, routeFetch, runDetail } from './test-fixtures';
import { CompareScreen } from './compare-screen';

jest.mock('@/components/charts/series-plot', () => jest.requireActual('@/components/charts/test-series-plot'));

const routes = { 'runs/compare': CompareScreen };
const idA = 'aaaaaaaa-aaaa-4aaa-8aaa-aaaaaaaaaaaa';
const idB = 'bbbbbbbb-bbbb-4bbb-8bbb-bbbbbbbbbbbb';
const stage = moduleDesign(idA, 'Detector stage', 31);
const single = moduleDesign(idB, 'Single couple', 1);
const run = runDetail('succeeded', { result: true });

function serve() {
  return routeFetch({
    'GET /api/runs': { status: 200, body: { runs: [run.run] } },
    [`GET /api/runs/${ids.run}`]: { status: 200, body: run },
    'GET /api/modules': { status: 200, body: { modules: [moduleSummary(stage), moduleSummary(single)] } },
    [`GET /api/modules/${idA}`]: { status: 200, body: { module: stage } },
    [`GET /api/modules/${idB}`]: { status: 200, body: { module: single } },
  });
}

describe('CompareScreen', () => {
  it('puts a run and a module side by side, each in its own table with units', async () => {
    serve();
    renderRoutes(routes, `/runs/compare?ids=${ids.run}&modules=${idA}`, sessionAs('viewer'));
    const runs = await screen.findByTestId('compare-table');
    expect(within(runs).getByTestId('compare-table-row-deltaT')).toHaveTextContent(/ΔT\s*[\d.]+\sK/);
    const modules = await screen.findByTestId('compare-modules-table');
    expect(within(modules).getByTestId('compare-modules-table-row-couples')).toHaveTextContent(/Couples N\s*31/);
    expect(within(modules).getByTestId('compare-modules-table-row-maxQc')).toHaveTextContent(/[\d.]+\sW at [\d.]+\sA/);
    expect(screen.getByTestId('compare-module-heat-load')).toBeOnTheScreen();
  });

  it('tells two runs of one design apart: number, launch time, starts and launcher in the picker, search settings in the table', async () => {
    const idC = 'cccccccc-cccc-4ccc-8ccc-cccccccccccc';
    const few = { ...run, run: { ...run.run, number: 7, starts: 3 } };
    const many = { ...run, run: { ...run.run, id: idC, number: 8, starts: 150, createdAt: '2026-02-01T16:45:00.000Z', launchedBy: 'Greta' }, design: { ...run.design, starts: 150, minZoneMm: 0.2 } };
    routeFetch({
      'GET /api/runs': { status: 200, body: { runs: [many.run, few.run] } },
      [`GET /api/runs/${ids.run}`]: { status: 200, body: few },
      [`GET /api/runs/${idC}`]: { status: 200, body: many },
      'GET /api/modules': { status: 200, body: { modules: [] } },
    });
    renderRoutes(routes, `/runs/compare?ids=${ids.run},${idC}`, sessionAs('viewer'));
    const table = await screen.findByTestId('compare-table');
    expect(screen.getByTestId(`pick-run-${ids.run}`)).toHaveTextContent(/^Run 7 · Detector p-leg · ΔT [\d.]+\sK · 1 Feb 2026, 10:00 UTC · 3 starts · Piet$/);
    expect(screen.getByTestId(`pick-run-${idC}`)).toHaveTextContent(/^Run 8 · Detector p-leg · ΔT [\d.]+\sK · 1 Feb 2026, 16:45 UTC · 150 starts · Greta$/);
    expect(table).toHaveTextContent(/Run 7.*Run 8/);
    expect(within(table).getByTestId('compare-table-row-starts')).toHaveTextContent(/Search starts\s*3\s*150/);
    expect(within(table).getByTestId('compare-table-row-launched')).toHaveTextContent(/1 Feb 2026, 10:00 UTC by Piet.*1 Feb 2026, 16:45 UTC by Greta/);
    expect(within(table).getByTestId('compare-table-row-minZone')).toHaveTextContent(/Minimum zone\s*none\s*0\.2\smm/);
    for (const key of ['objective', 'conditions', 'bounds', 'nodes', 'monotone', 'ends', 'family', 'engine']) expect(within(table).getByTestId(`compare-table-row-${key}`)).toBeOnTheScreen();
  });

  it('adds a module from the picker and keeps the choice in the address', async () => {
    serve();
    const result = renderRoutes(routes, `/runs/compare?modules=${idA}`, sessionAs('viewer'));
    expect(await screen.findByText('Pick at least two things')).toBeOnTheScreen();
    await act(async () => fireEvent.press(await screen.findByTestId(`pick-module-${idB}`)));
    await waitFor(() => expect(result.getSearchParams()).toMatchObject({ modules: `${idA},${idB}` }));
    const table = await screen.findByTestId('compare-modules-table');
    expect(within(table).getByTestId('compare-modules-table-row-couples')).toHaveTextContent(/Couples N\s*31\s*1$/);
    expect(screen.queryByTestId('compare-table')).toBeNull();
  });
});
