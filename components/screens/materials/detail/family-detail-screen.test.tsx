import { Text } from 'react-native';
import { act, fireEvent, screen, waitFor } from 'expo-router/testing-library';
import { renderRoutes } from '@/components/test-router';
import { mockFetch, sessionAs } from '@/components/test-utils';
import { bandDetail, bandId, familySummary } from '../test-fixtures';
import { FamilyDetailScreen } from './family-detail-screen';

// Skia does not run under jest: the stand-in prints what the chart would show.
jest.mock('@/components/charts/series-plot', () => jest.requireActual('@/components/charts/test-series-plot'));

const routes = {
  index: () => <Text>Materials list</Text>,
  'materials/[id]/index': FamilyDetailScreen,
  'materials/[id]/edit': () => <Text>Edit form</Text>,
};

describe('FamilyDetailScreen', () => {
  it('shows a band family: provenance, parameters in trade units, locked versions, plots', async () => {
    const { calls } = mockFetch({ status: 200, body: bandDetail() });
    renderRoutes(routes, `/materials/${bandId}`, sessionAs('physicist'));

    expect(await screen.findByRole('heading', { name: 'Graded p-leg model' })).toBeOnTheScreen();
    expect(calls[0]).toBe(`/api/families/${bandId}`);
    expect(screen.getByTestId('family-overview')).toHaveTextContent(/VERSION 3 OF 3.*p-type · holes.*Fit to ingot 7, revision 3/);
    expect(screen.getByTestId('param-mobility300')).toHaveTextContent(/μ₃₀₀.*280\scm²\/\(V·s\)$/);
    expect(screen.getByTestId('param-effectiveMass')).toHaveTextContent(/m\*.*1\.2\sm₀$/);
    expect(screen.getByTestId('param-latticeKappa300')).toHaveTextContent(/κL,300.*0\.9\sW\/\(m·K\)$/);
    expect(screen.getByTestId('version-1')).toHaveTextContent(/Used by 4 runs · locked/);
    expect(screen.getByTestId('version-2')).toHaveTextContent(/Used by 1 run · locked/);
    expect(screen.getByTestId('version-3')).toHaveTextContent(/CURRENT.*Not used by any run yet/);
    expect(screen.getByRole('button', { name: 'Duplicate' })).toBeOnTheScreen();
    expect(screen.getByText('Edit')).toBeOnTheScreen();

    const seebeck = screen.getByTestId('plot-seebeck');
    expect(seebeck).toHaveTextContent(/at 250 K, 300 K, 350 K, from the band model \| S \(µV\/K\) vs .* \| 250 K:41 300 K:41 350 K:41/);
    expect(screen.getByTestId('plot-optimum')).toHaveTextContent(/At 200 K: best zT [\d.]+ at n = [\d.]+ × 10¹⁹ cm⁻³/);
  });

  it('adds a temperature to every plot when its chip is switched on', async () => {
    mockFetch({ status: 200, body: bandDetail() });
    renderRoutes(routes, `/materials/${bandId}`, sessionAs('viewer'));
    await screen.findByTestId('plot-zT');
    expect(screen.getByTestId('plot-zT')).not.toHaveTextContent(/400 K/);

    fireEvent.press(screen.getByRole('checkbox', { name: '400 K' }));
    expect(screen.getByTestId('plot-zT')).toHaveTextContent(/at 250 K, 300 K, 350 K, 400 K/);
    expect(screen.getByTestId('plot-kappa')).toHaveTextContent(/400 K:41/);
    // The last one left cannot be switched off.
    for (const t of ['250 K', '300 K', '350 K', '400 K']) fireEvent.press(screen.getByRole('checkbox', { name: t }));
    expect(screen.getByTestId('plot-zT')).toHaveTextContent(/at 400 K, from/);
  });

  it('lets a viewer read and export but not change', async () => {
    mockFetch({ status: 200, body: bandDetail() });
    renderRoutes(routes, `/materials/${bandId}`, sessionAs('viewer'));
    await screen.findByRole('heading', { name: 'Graded p-leg model' });
    expect(screen.queryByText('Edit')).toBeNull();
    expect(screen.queryByRole('button', { name: 'Archive' })).toBeNull();
    expect(screen.getByText('Export CSV')).toBeOnTheScreen();
    expect(screen.getByText('Export JSON')).toBeOnTheScreen();
  });

  it('shows an older version from ?version= and points back to the current one', async () => {
    const older = bandDetail({ version: 2, runCount: 1, source: 'Fit to ingot 7, revision 2' });
    const { calls } = mockFetch({ status: 200, body: older });
    renderRoutes(routes, `/materials/${bandId}?version=2`, sessionAs('physicist'));

    expect(await screen.findByTestId('older-version')).toHaveTextContent(/Showing version 2 of 3/);
    expect(calls[0]).toBe(`/api/families/${bandId}/versions/2`);
    expect(screen.getByTestId('family-overview')).toHaveTextContent(/revision 2/);
    expect(screen.getByText(/Exports are of version 2/)).toBeOnTheScreen();
  });

  it('archives, then offers to restore', async () => {
    const archived = familySummary({ archived: true });
    const { requests } = mockFetch(
      { status: 200, body: bandDetail() },
      { status: 200, body: { family: archived } },
      { status: 200, body: { ...bandDetail(), family: archived } },
    );
    renderRoutes(routes, `/materials/${bandId}`, sessionAs('admin'));
    fireEvent.press(await screen.findByRole('button', { name: 'Archive' }));

    expect(await screen.findByRole('button', { name: 'Restore from archive' })).toBeOnTheScreen();
    expect(requests[1]).toMatchObject({ method: 'POST', url: `/api/families/${bandId}/archive` });
    expect(screen.getByText(/Archived: hidden from the active list/)).toBeOnTheScreen();
    expect(screen.queryByText('Edit')).toBeNull();
  });

  it('duplicates under a new name and opens the copy', async () => {
    const copyId = '33333333-3333-4333-8333-333333333333';
    const copy = familySummary({ id: copyId, name: 'Graded p-leg model, thinner', version: 1 });
    const { requests } = mockFetch(
      { status: 200, body: bandDetail() },
      { status: 201, body: { family: copy } },
      { status: 200, body: { ...bandDetail(), family: copy } },
    );
    const result = renderRoutes(routes, `/materials/${bandId}`, sessionAs('physicist'));
    fireEvent.press(await screen.findByRole('button', { name: 'Duplicate' }));
    fireEvent.changeText(screen.getByTestId('field-duplicate-name'), 'Graded p-leg model, thinner');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Make the copy' })));

    await waitFor(() => expect(result.getPathname()).toBe(`/materials/${copyId}`));
    expect(requests[1]).toEqual({
      method: 'POST',
      url: `/api/families/${bandId}/duplicate`,
      body: { name: 'Graded p-leg model, thinner' },
    });
  });

  it('says when the family is not in the team, without a pointless retry', async () => {
    mockFetch({ status: 404, body: { name: 'NotFound', message: 'No material family with this id in your team.' } });
    renderRoutes(routes, `/materials/${bandId}`, sessionAs('physicist'));
    expect(await screen.findByText('This family is not in your team')).toBeOnTheScreen();
    expect(screen.getByText('No material family with this id in your team.')).toBeOnTheScreen();
    expect(screen.queryByRole('button', { name: 'Try again' })).toBeNull();
  });
});
