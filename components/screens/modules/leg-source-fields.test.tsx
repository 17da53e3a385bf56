import { fireEvent, screen } from '@testing-library/react-native';
import type { LegText } from './module-form-model';
import { emptyLeg } from './module-form-model';
import { renderWithProviders, sessionAs } from '@/components/test-utils';
import { design, familiesResponse, routeFetch, runSummary } from '@/components/screens/runs/test-fixtures';
import { LegSourceFields } from './leg-source-fields';

const pRun = '33333333-3333-4333-8333-000000000001';
const nRun = '33333333-3333-4333-8333-000000000002';
const running = '33333333-3333-4333-8333-000000000003';
const nDesign = '22222222-2222-4222-8222-000000000002';
const nFamily = '66666666-6666-4666-8666-666666666666';

function serve() {
  const families = familiesResponse();
  families.families.push({ ...families.families[0]!, id: nFamily, name: 'Test n-type band model', carrier: 'n' });
  routeFetch({
    'GET /api/runs': {
      status: 200,
      body: {
        runs: [
          runSummary('succeeded', { id: pRun, best: 87.3, designName: 'Detector p-leg' }),
          runSummary('succeeded', { id: nRun, best: 80.1, designId: nDesign, designName: 'Detector n-leg' }),
          runSummary('running', { id: running, designName: 'Detector p-leg, still running' }),
        ],
      },
    },
    'GET /api/designs': { status: 200, body: { designs: [design(), design({ id: nDesign, name: 'Detector n-leg', carrier: 'n', familyId: nFamily })] } },
    'GET /api/families': { status: 200, body: families },
  });
}

function renderLeg(side: 'p' | 'n', value: LegText) {
  const onChange = jest.fn();
  renderWithProviders(<LegSourceFields side={side} value={value} onChange={onChange} errors={{}} />, { session: sessionAs('physicist') });
  return onChange;
}

describe('LegSourceFields', () => {
  it('offers finished runs of the leg’s own carrier by name, not by id, and picks one', async () => {
    serve();
    const onChange = renderLeg('n', emptyLeg('run'));
    const choice = await screen.findByTestId(`n-run-${nRun}`);
    expect(choice).toHaveTextContent(/Detector n-leg · ΔT 80\.1\sK · 1 Feb 2026/);
    // A p-type run and an unfinished run are not offered for the n leg.
    expect(screen.queryByTestId(`n-run-${pRun}`)).toBeNull();
    expect(screen.queryByTestId(`n-run-${running}`)).toBeNull();
    fireEvent.press(choice);
    expect(onChange).toHaveBeenCalledWith(expect.objectContaining({ kind: 'run', runId: nRun }));
  });

  it('keeps the run it was opened with selected (from a run’s curves page)', async () => {
    serve();
    renderLeg('p', emptyLeg('run', pRun));
    expect(await screen.findByTestId(`p-run-${pRun}`)).toBeChecked();
  });

  it('lists only families of the leg’s carrier, and carrier-free constant ones', async () => {
    serve();
    renderLeg('n', emptyLeg('family'));
    expect(await screen.findByTestId(`n-family-${nFamily}`)).toBeOnTheScreen();
    expect(screen.getByTestId('n-family-55555555-5555-4555-8555-555555555555')).toBeOnTheScreen();
    expect(screen.queryByTestId('n-family-11111111-1111-4111-8111-111111111111')).toBeNull();
  });
});
