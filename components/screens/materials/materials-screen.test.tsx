import { Text } from 'react-native';
import { act, fireEvent, screen, waitFor } from 'expo-router/testing-library';
import type { FamiliesResponse, FamilySummary } from '@/shared/api/families';
import { renderRoutes } from '@/components/test-router';
import { mockFetch, sessionAs } from '@/components/test-utils';
import { MaterialsScreen } from './materials-screen';

const routes = {
  index: MaterialsScreen,
  'materials/[id]/index': () => <Text>Family page</Text>,
  'materials/new': () => <Text>New family form</Text>,
  'materials/upload': () => <Text>Upload page</Text>,
};

const renderMaterials = (role: 'physicist' | 'viewer' = 'physicist') => renderRoutes(routes, '/', sessionAs(role));

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
    version: 1,
    archived: false,
    updatedAt: '2025-11-03T09:30:00.000Z',
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
    renderMaterials();

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
    renderMaterials();

    expect(await screen.findByText('No material families yet')).toBeOnTheScreen();
    expect(screen.getByText(`${team.name} · 0 families`)).toBeOnTheScreen();
  });

  it('shows the API error message and recovers on retry', async () => {
    const { calls } = mockFetch(
      { status: 500, body: { name: 'InternalError', message: 'The database is restarting.' } },
      { status: 200, body: twoFamilies },
    );
    renderMaterials();

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
    renderMaterials();

    expect(await screen.findByText(/does not understand \(\/api\/families\)/)).toBeOnTheScreen();
  });
  it('shows archived families on request, from their own query', async () => {
    const archived = family({ id: '33333333-3333-4333-8333-333333333333', name: 'Ingot 3 (retired)', archived: true, version: 2 });
    const { calls } = mockFetch({ status: 200, body: twoFamilies }, { status: 200, body: { team, families: [archived] } });
    renderMaterials();
    await screen.findByText('Graded p-leg model');

    fireEvent.press(screen.getByRole('tab', { name: 'Archived' }));
    expect(await screen.findByText('Ingot 3 (retired)')).toBeOnTheScreen();
    expect(calls).toEqual(['/api/families', '/api/families?archived=1']);
    expect(screen.getByText(`${team.name} · 1 archived family`)).toBeOnTheScreen();
    expect(screen.getByTestId('family-card-33333333-3333-4333-8333-333333333333')).toHaveTextContent(/V2.*ARCHIVED/);
    expect(screen.queryByText('Graded p-leg model')).toBeNull();
  });

  it('offers new and upload to physicists only, and opens a family from its card', async () => {
    mockFetch({ status: 200, body: twoFamilies });
    const result = renderMaterials();
    await screen.findByText('Graded p-leg model');
    expect(screen.getByText('New band-model family')).toBeOnTheScreen();
    expect(screen.getByText('Upload measured table')).toBeOnTheScreen();

    await act(async () => fireEvent.press(screen.getByTestId('family-card-22222222-2222-4222-8222-222222222222')));
    await waitFor(() => expect(result.getPathname()).toBe('/materials/22222222-2222-4222-8222-222222222222'));
  });

  it('hides the write actions from a viewer', async () => {
    mockFetch({ status: 200, body: twoFamilies });
    renderMaterials('viewer');
    await screen.findByText('Graded p-leg model');
    expect(screen.queryByText('New band-model family')).toBeNull();
    expect(screen.queryByText('Upload measured table')).toBeNull();
  });
});
