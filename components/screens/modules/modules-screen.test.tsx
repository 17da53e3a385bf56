import { Text } from 'react-native';
import { act, fireEvent, screen, waitFor } from 'expo-router/testing-library';
import { renderRoutes } from '@/components/test-router';
import { sessionAs } from '@/components/test-utils';
import { routeFetch } from '@/components/screens/runs/test-fixtures';
import { moduleDesign, moduleSummary } from './module-fixtures';
import { ModulesScreen } from './modules-screen';

const routes = { 'modules/index': ModulesScreen, 'modules/new': () => <Text>New module page</Text>, 'runs/compare': () => <Text>Compare page</Text> };
const idA = 'aaaaaaaa-aaaa-4aaa-8aaa-aaaaaaaaaaaa';
const idB = 'bbbbbbbb-bbbb-4bbb-8bbb-bbbbbbbbbbbb';
const modules = [moduleSummary(moduleDesign(idA, 'Detector stage, 31 couples', 31, { currentLimit: 5 })), moduleSummary(moduleDesign(idB, 'Single couple', 1))];

describe('ModulesScreen', () => {
  it('lists saved modules with their settings and leg sources in words', async () => {
    routeFetch({ 'GET /api/modules': { status: 200, body: { modules } } });
    renderRoutes(routes, '/modules', sessionAs('viewer'));
    const row = await screen.findByTestId(`module-row-${idA}`);
    expect(row).toHaveTextContent(/Detector stage, 31 couples/);
    expect(row).toHaveTextContent(/31 couples · Th 300\sK · ΔT 20\sK · limit 5 A/);
    expect(row).toHaveTextContent(/p: Stage-2 leg, optimum leg of a run/);
    expect(row).toHaveTextContent(/n: NL-N3 n-type band model at 2 × 10¹⁹\scm⁻³/);
    expect(screen.getByTestId(`module-row-${idB}`)).toHaveTextContent(/1 couple · /);
    // A viewer reads modules but cannot make one.
    expect(screen.queryByTestId('new-module')).toBeNull();
  });

  it('sends ticked modules to the comparison', async () => {
    routeFetch({ 'GET /api/modules': { status: 200, body: { modules } } });
    const result = renderRoutes(routes, '/modules', sessionAs('physicist'));
    await screen.findByTestId(`module-row-${idA}`);
    expect(screen.getByTestId('new-module')).toBeOnTheScreen();
    fireEvent.press(screen.getByTestId(`compare-module-${idA}`));
    fireEvent.press(screen.getByTestId(`compare-module-${idB}`));
    await act(async () => fireEvent.press(screen.getByTestId('module-compare-link')));
    await waitFor(() => expect(result.getPathname()).toBe('/runs/compare'));
    expect(result.getSearchParams()).toEqual({ modules: `${idA},${idB}` });
  });

  it('explains how to make the first module', async () => {
    routeFetch({ 'GET /api/modules': { status: 200, body: { modules: [] } } });
    renderRoutes(routes, '/modules', sessionAs('physicist'));
    expect(await screen.findByText('No modules yet')).toBeOnTheScreen();
  });
});
