import { Text } from 'react-native';
import { screen } from 'expo-router/testing-library';
import { renderRoutes } from '@/components/test-router';
import { sessionAs } from '@/components/test-utils';
import { routeFetch } from '@/components/screens/runs/test-fixtures';
import { StagesScreen } from './stages-screen';
import { cascadeCooler, coolerIds, coolerSummary, coupleCooler } from './test-fixtures';

const routes = { 'stages/index': StagesScreen, 'stages/new-cascade': () => <Text>New cascade page</Text>, 'runs/index': () => <Text>Runs</Text> };

function serve() {
  routeFetch({
    'GET /api/coolers': {
      status: 200,
      body: { coolers: [coolerSummary(cascadeCooler(), { id: coolerIds.cascadeRun, number: 9, state: 'succeeded', deltaT: 96.8, power: 2.11 }), coolerSummary(coupleCooler())] },
    },
  });
}

describe('StagesScreen', () => {
  it('lists cascades and couples with their settings and latest run, and offers a physicist new ones', async () => {
    serve();
    renderRoutes(routes, '/stages', sessionAs('physicist'));
    const row = await screen.findByTestId(`cooler-row-${coolerIds.cascade}`);
    expect(row).toHaveTextContent(/Cascade.*Detector cascade, 3 stages/);
    expect(row).toHaveTextContent(/3 stages · 4 \/ 12 \/ 36 couples · Th 300\sK · Qc 5\smW · stages in series/);
    expect(screen.getByTestId(`cooler-latest-${coolerIds.cascade}`)).toHaveTextContent(/Succeeded.*Run 9 · ΔT 96\.8\sK · P 2\.11\sW/);
    expect(screen.getByTestId(`cooler-latest-${coolerIds.couple}`)).toHaveTextContent('Not run yet');
    expect(screen.getByTestId('new-cascade')).toBeOnTheScreen();
    expect(screen.getByTestId('new-couple')).toBeOnTheScreen();
    expect(screen.queryByTestId('write-guard')).toBeNull();
  });

  it('gives a viewer the list to read with the read-only notice and no write controls', async () => {
    serve();
    renderRoutes(routes, '/stages', sessionAs('viewer'));
    await screen.findByTestId(`cooler-row-${coolerIds.cascade}`);
    expect(screen.queryByTestId('new-cascade')).toBeNull();
    expect(screen.queryByTestId('new-couple')).toBeNull();
    expect(screen.getByTestId('write-guard')).toHaveTextContent(/is for physicists and admins; you are signed in as viewer/);
  });
});
