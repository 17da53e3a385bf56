import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import type { FamiliesResponse, FamilySummary } from '@/shared/api/families';
import { mockFetch, renderWithProviders } from '@/components/test-utils';
import { MaterialsScreen } from './materials-screen';

function family(overrides: Partial<FamilySummary>): FamilySummary {
  return {
    id: '6f1c2a3e-0d4b-4c5e-9a7b-1e2f3a4b5c6d',
    name: 'Family',
    kind: 'band',
    carrier: 'p',
    summary: '',
    source: 'Lab notebook',
    createdBy: 'someone@example.org',
    createdAt: '2025-11-03T09:30:00.000Z',
    isDemo: false,
    ...overrides,
  };
}

const team = { id: 'team-1', name: 'Northlight Sensors — detector cooling group' };

const twoFamilies: FamiliesResponse = {
  team,
  families: [
    family({
      id: '11111111-1111-4111-8111-111111111111',
      name: 'Graded p-leg model',
      summary: 'Single parabolic band, acoustic-phonon scattering.',
      source: 'Demo data: invented values',
      createdBy: 'ada@northlight.example',
      isDemo: true,
    }),
    family({
      id: '22222222-2222-4222-8222-222222222222',
      name: 'Batch 14 n-type measurements',
      kind: 'table',
      carrier: 'n',
      source: 'Hall and Seebeck rig, run 14',
      createdBy: 'grower@northlight.example',
      createdAt: '2026-01-20T16:00:00.000Z',
    }),
  ],
};

describe('MaterialsScreen', () => {
  it('lists one card per family with kind, carrier, provenance and demo badge', async () => {
    const { calls } = mockFetch({ status: 200, body: twoFamilies });
    renderWithProviders(<MaterialsScreen />);

    expect(await screen.findByText('Graded p-leg model')).toBeOnTheScreen();
    expect(screen.getByText('Batch 14 n-type measurements')).toBeOnTheScreen();
    expect(calls).toEqual(['/api/families']);
    expect(screen.getByText(`${team.name} · 2 families`)).toBeOnTheScreen();

    const demoCard = screen.getByTestId('family-card-11111111-1111-4111-8111-111111111111');
    const tableCard = screen.getByTestId('family-card-22222222-2222-4222-8222-222222222222');
    expect(demoCard).toHaveTextContent(/BAND MODEL/);
    expect(demoCard).toHaveTextContent(/p-type · holes/);
    expect(demoCard).toHaveTextContent(/DEMO DATA/);
    expect(demoCard).toHaveTextContent(/3 Nov 2025 by ada@northlight\.example/);
    expect(tableCard).toHaveTextContent(/MEASURED TABLE/);
    expect(tableCard).toHaveTextContent(/n-type · electrons/);
    expect(tableCard).toHaveTextContent(/Hall and Seebeck rig, run 14/);
    expect(tableCard).not.toHaveTextContent(/DEMO DATA/);
    expect(screen.getAllByText('DEMO DATA')).toHaveLength(1);
  });

  it('says so when the team has no families', async () => {
    mockFetch({ status: 200, body: { team, families: [] } });
    renderWithProviders(<MaterialsScreen />);

    expect(await screen.findByText('No material families yet')).toBeOnTheScreen();
    expect(screen.getByText(`${team.name} · 0 families`)).toBeOnTheScreen();
  });

  it('shows the API error message and recovers on retry', async () => {
    const { calls } = mockFetch(
      { status: 500, body: { name: 'InternalError', message: 'The database is restarting.' } },
      { status: 200, body: twoFamilies },
    );
    renderWithProviders(<MaterialsScreen />);

    expect(await screen.findByText('The database is restarting.')).toBeOnTheScreen();
    expect(screen.getByText('Could not load material families')).toBeOnTheScreen();
    expect(screen.queryByText('Graded p-leg model')).toBeNull();

    fireEvent.press(screen.getByRole('button', { name: 'Try again' }));

    expect(await screen.findByText('Graded p-leg model')).toBeOnTheScreen();
    await waitFor(() => expect(screen.queryByText('The database is restarting.')).toBeNull());
    expect(calls).toHaveLength(2);
  });

  it('reports an answer that does not match the shared schema', async () => {
    mockFetch({ status: 200, body: '<!doctype html><p>not the API</p>' });
    renderWithProviders(<MaterialsScreen />);

    expect(await screen.findByText(/does not understand \(\/api\/families\)/)).toBeOnTheScreen();
  });
});
