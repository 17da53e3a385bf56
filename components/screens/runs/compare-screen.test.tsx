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
