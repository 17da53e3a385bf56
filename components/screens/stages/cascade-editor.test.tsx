import { fireEvent, screen } from '@testing-library/react-native';
import { renderWithProviders, sessionAs } from '@/components/test-utils';
import { familiesResponse, routeFetch } from '@/components/screens/runs/test-fixtures';
import { CascadeEditor } from './cascade-editor';
import { defaultCascadeText } from './cascade-form-model';

const pFamily = '11111111-1111-4111-8111-111111111111';
const nFamily = '55555555-5555-4555-8555-555555555555';

function filled() {
  const t = defaultCascadeText();
  return { ...t, name: 'Two stages', stages: t.stages.map((s) => ({ ...s, p: { ...s.p, familyId: pFamily }, n: { ...s.n, familyId: nFamily } })) };
}

describe('CascadeEditor', () => {
  it('says which stage a leg message belongs to, next to the field and in the summary', async () => {
    routeFetch({ 'GET /api/families': { status: 200, body: familiesResponse() }, 'GET /api/runs': { status: 200, body: { runs: [] } } });
    renderWithProviders(<CascadeEditor initial={defaultCascadeText()} savedId={null} onSaved={jest.fn()} />, { session: sessionAs('physicist') });
    fireEvent.press(screen.getByRole('button', { name: 'Save' }));
    expect(screen.getByTestId('cooler-form-problems')).toHaveTextContent(/Stage 1, p-type leg: pick a family.*Stage 2, n-type leg: pick a family.*Name is required/);
    expect(screen.getByTestId('stage-2-n-family-error')).toHaveTextContent('Stage 2, n-type leg: pick a family');
  });

  it('shows the API’s refusal under the stage field it names and sends the load in W', async () => {
    const { requests } = routeFetch({
      'GET /api/families': { status: 200, body: familiesResponse() },
      'GET /api/runs': { status: 200, body: { runs: [] } },
      'POST /api/coolers': { status: 400, body: { name: 'ValidationError', message: 'Check the fields', errors: [{ field: 'stages[1].couples', message: 'Couples N: the engine found no steady state with so few couples on the hot stage' }] } },
    });
    renderWithProviders(<CascadeEditor initial={filled()} savedId={null} onSaved={jest.fn()} />, { session: sessionAs('physicist') });
    fireEvent.press(screen.getByRole('button', { name: 'Save' }));
    expect(await screen.findByTestId('error-stage-2-couples')).toHaveTextContent(/no steady state with so few couples/);
    const sent = requests.find((r) => r.method === 'POST')?.body as { heatLoad: number; stages: unknown[] };
    expect(sent.heatLoad).toBeCloseTo(0.005, 12);
    expect(sent.stages).toHaveLength(2);
  });

  it('offers a physicist Save and launch, and at most four stages', () => {
    routeFetch({ 'GET /api/families': { status: 200, body: familiesResponse() }, 'GET /api/runs': { status: 200, body: { runs: [] } } });
    renderWithProviders(<CascadeEditor initial={filled()} savedId={null} onSaved={jest.fn()} />, { session: sessionAs('physicist') });
    expect(screen.getByRole('button', { name: 'Save and launch' })).toBeOnTheScreen();
    fireEvent.press(screen.getByRole('button', { name: 'Add a stage at the hot end' }));
    fireEvent.press(screen.getByRole('button', { name: 'Add a stage at the hot end' }));
    expect(screen.getByTestId('stage-4')).toBeOnTheScreen();
    expect(screen.queryByRole('button', { name: 'Add a stage at the hot end' })).toBeNull();
    expect(screen.getByText('4 stages is the most a cascade may have.')).toBeOnTheScreen();
  });
});
