import { screen, waitFor } from 'expo-router/testing-library';
import { renderRoutes } from '@/components/test-router';
import { sessionAs } from '@/components/test-utils';
import { routeFetch } from '@/components/screens/runs/test-fixtures';
import { moduleDesign, moduleSummary } from './module-fixtures';
import { ModuleScreen } from './module-screen';

jest.mock('@/components/charts/series-plot', () => jest.requireActual('@/components/charts/test-series-plot'));

const id = 'aaaaaaaa-aaaa-4aaa-8aaa-aaaaaaaaaaaa';
const saved = moduleDesign(id, 'Detector stage', 31, { currentLimit: 5 });
const routes = { 'modules/[id]': ModuleScreen };

function serve() {
  routeFetch({
    [`GET /api/modules/${id}`]: { status: 200, body: { module: saved } },
    'GET /api/modules': { status: 200, body: { modules: [moduleSummary(saved)] } },
    'GET /api/families': { status: 200, body: { families: [] } },
    'GET /api/runs': { status: 200, body: { runs: [] } },
    'GET /api/designs': { status: 200, body: { designs: [] } },
  });
}

describe('ModuleScreen', () => {
  it('shows a viewer the saved settings as text with a notice why, and no inputs', async () => {
    serve();
    renderRoutes(routes, `/modules/${id}`, sessionAs('viewer'));
    const facts = await screen.findByTestId('module-facts');
    expect(screen.getByTestId('write-guard')).toHaveTextContent(/Saving modules is for physicists and admins; you are signed in as viewer/);
    await waitFor(() => expect(screen.getByTestId('fact-n')).toHaveTextContent(/NL-N3/));
    expect(screen.getByTestId('fact-n')).toHaveTextContent(/NL-N3 n-type band model at 2 × 10¹⁹\scm⁻³/);
    expect(screen.getByTestId('fact-hotSide')).toHaveTextContent(/Hot-side temperature Th\s*300\sK/);
    expect(screen.getByTestId('fact-currentLimit')).toHaveTextContent(/Supply or wire current limit\s*5\sA/);
    expect(facts).not.toHaveTextContent(/20000000000000000000/);
    expect(screen.queryByTestId('field-module-name')).toBeNull();
    expect(screen.queryByTestId('field-module-hotSide')).toBeNull();
    expect(screen.queryByText('Save changes')).toBeNull();
    expect(screen.getByTestId('module-csv')).toBeOnTheScreen();
  });

  it('gives a physicist the form, the doping written as an input reads it back', async () => {
    serve();
    renderRoutes(routes, `/modules/${id}`, sessionAs('physicist'));
    expect(await screen.findByText('Save changes')).toBeOnTheScreen();
    expect(screen.getByTestId('field-n-per-cm3')).toHaveDisplayValue('2e19');
    expect(screen.queryByTestId('module-facts')).toBeNull();
  });
});
