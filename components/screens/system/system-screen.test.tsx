import { screen } from '@testing-library/react-native';
import type { HealthResponse } from '@/shared/api/health';
import { mockFetch, renderWithProviders } from '@/components/test-utils';
import { SystemScreen } from './system-screen';

// Skia is not available under jest; the chart is checked in the browser test.
jest.mock('@/components/charts/line-plot', () => ({ LinePlot: () => null }));

const degraded: HealthResponse = {
  status: 'degraded',
  version: '0.1.0+abc1234',
  checks: {
    database: { ok: true, detail: 'PostgreSQL answered in 2 ms' },
    queue: { ok: true, detail: 'pg-boss up' },
    worker: { ok: false, detail: 'no worker has ever reported' },
    mail: { ok: true, detail: 'SMTP server answered' },
  },
};

describe('SystemScreen', () => {
  it('shows a degraded server (503) check by check, in words', async () => {
    mockFetch({ status: 503, body: degraded });
    renderWithProviders(<SystemScreen />);

    expect(await screen.findByText('Degraded: some parts need attention')).toBeOnTheScreen();
    expect(screen.getByLabelText('Workers: problem')).toHaveTextContent(
      /Problem.*no worker has ever reported/,
    );
    expect(screen.getByLabelText('Database: working')).toHaveTextContent(/Working/);
    expect(screen.getAllByText('Working')).toHaveLength(3);
    expect(screen.getAllByText('Problem')).toHaveLength(1);
    expect(screen.getByText(/version 0\.1\.0\+abc1234/)).toBeOnTheScreen();
  });

  it('shows a member only ok or degraded and the version, and says who sees the checks', async () => {
    mockFetch({ status: 503, body: { status: 'degraded', version: '0.1.0' } });
    renderWithProviders(<SystemScreen />);

    expect(await screen.findByText('Degraded: some parts need attention')).toBeOnTheScreen();
    expect(screen.getByText(/version 0\.1\.0 · checked/)).toBeOnTheScreen();
    expect(screen.getByTestId('health-details-hidden')).toHaveTextContent(/Details are for admins/);
    expect(screen.queryByLabelText('Health checks')).toBeNull();
    expect(screen.queryByText('Problem')).toBeNull();
  });

  it('shows a stranger\'s answer (no version) without inventing one', async () => {
    mockFetch({ status: 200, body: { status: 'ok' } });
    renderWithProviders(<SystemScreen />);

    expect(await screen.findByText('All systems working')).toBeOnTheScreen();
    expect(screen.getByText(/^checked /)).toBeOnTheScreen();
    expect(screen.queryByText(/version/)).toBeNull();
  });

  it('shows a network failure with a retry', async () => {
    global.fetch = jest.fn(async () => {
      throw new TypeError('Failed to fetch');
    }) as unknown as typeof fetch;
    renderWithProviders(<SystemScreen />);

    expect(await screen.findByText(/Could not reach the Frostgrade server/)).toBeOnTheScreen();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeOnTheScreen();
  });
});
