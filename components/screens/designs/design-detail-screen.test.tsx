import { Text } from 'react-native';
import { act, fireEvent, screen, waitFor } from 'expo-router/testing-library';
import { sockets } from '@/components/realtime/test-socket';
import { renderRoutes } from '@/components/test-router';
import { sessionAs } from '@/components/test-utils';
import { design, familyDetail, ids, routeFetch, runSummary, type SentRequest } from '../runs/test-fixtures';
import { DesignDetailScreen } from './design-detail-screen';

jest.mock('socket.io-client', () => jest.requireActual('@/components/realtime/test-socket'));

const routes = {
  'designs/[id]/index': DesignDetailScreen,
  'designs/[id]/edit': () => <Text>Edit form</Text>,
  'runs/[id]': () => <Text>Run page</Text>,
  'sweeps/[id]': () => <Text>Sweep page</Text>,
};

function open(role: 'physicist' | 'viewer') {
  let following = true;
  const fetched = routeFetch({
    [`GET /api/designs/${ids.design}`]: () => ({ status: 200, body: { design: design({ following }) } }),
    [`GET /api/runs?designId=${ids.design}`]: { status: 200, body: { runs: [runSummary('succeeded', { best: 87.3, deltaT: 87.3 })] } },
    [`GET /api/families/${ids.family}/versions/2`]: { status: 200, body: familyDetail() },
    [`POST /api/designs/${ids.design}/runs`]: { status: 201, body: { run: runSummary('queued') } },
    [`DELETE /api/designs/${ids.design}/follow`]: () => {
      following = false;
      return { status: 200, body: { design: design({ following }) } };
    },
    [`POST /api/designs/${ids.design}/sweeps`]: (req: SentRequest) => ({
      status: 201,
      body: { sweep: { id: ids.sweep, designId: ids.design, parameter: 'hotSide', values: (req.body as { values: number[] }).values, createdAt: '2026-02-01T10:00:00.000Z', runs: [] } },
    }),
  });
  const result = renderRoutes(routes, `/designs/${ids.design}`, sessionAs(role));
  return { ...fetched, result };
}

afterEach(() => {
  sockets.length = 0;
});

describe('DesignDetailScreen', () => {
  it('shows the design in trade units and its runs; a viewer may follow but not launch, edit or sweep', async () => {
    open('viewer');
    expect(await screen.findByRole('heading', { name: 'Detector p-leg' })).toBeOnTheScreen();
    expect(screen.getByTestId('fact-lengthMm')).toHaveTextContent(/1\.5\smm$/);
    expect(screen.getByTestId('fact-doping')).toHaveTextContent(/1 × 10¹⁸\scm⁻³ to 1 × 10²⁰\scm⁻³/);
    expect(await screen.findByText(/Best ΔT 87\.3\sK/)).toBeOnTheScreen();
    expect(screen.getByRole('button', { name: 'Unfollow' })).toBeOnTheScreen();
    expect(screen.queryByRole('button', { name: 'Launch run' })).toBeNull();
    expect(screen.queryByText('Edit')).toBeNull();
    expect(screen.queryByText('Sweep a parameter')).toBeNull();
  });

  it('launches a run and opens its page', async () => {
    const { requests, result } = open('physicist');
    fireEvent.press(await screen.findByRole('button', { name: 'Launch run' }));
    await waitFor(() => expect(result.getPathname()).toBe(`/runs/${ids.run}`));
    expect(requests.filter((r) => r.method === 'POST').map((r) => r.url)).toEqual([`/api/designs/${ids.design}/runs`]);
  });

  it('unfollows', async () => {
    const { requests } = open('physicist');
    fireEvent.press(await screen.findByRole('button', { name: 'Unfollow' }));
    expect(await screen.findByRole('button', { name: 'Follow' })).toBeOnTheScreen();
    expect(screen.getByTestId('follow-state')).toHaveTextContent(/do not follow/);
    expect(requests.some((r) => r.method === 'DELETE')).toBe(true);
  });

  it('checks sweep values before launching, then launches one run per value', async () => {
    const { requests, result } = open('physicist');
    const values = await screen.findByTestId('field-sweep-values');
    fireEvent.changeText(values, '280, 1500');
    fireEvent.press(screen.getByRole('button', { name: 'Launch sweep of 2 runs' }));
    expect(screen.getByTestId('error-sweep-values')).toHaveTextContent(/At 1500\sK: Hot-side temperature Th above 1000 K/);
    expect(requests.some((r) => r.url.endsWith('/sweeps'))).toBe(false);
    fireEvent.changeText(values, '280 290 300 310');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Launch sweep of 4 runs' })));
    await waitFor(() => expect(result.getPathname()).toBe(`/sweeps/${ids.sweep}`));
    expect(requests.find((r) => r.url.endsWith('/sweeps'))?.body).toEqual({ parameter: 'hotSide', values: [280, 290, 300, 310] });
  });
});
