import { Text } from 'react-native';
import { act, fireEvent, screen, waitFor, within } from 'expo-router/testing-library';
import type { Role } from '@/shared/api/auth';
import type { GrowthOrderDetail } from '@/shared/api/growth';
import { formatNumber } from '@/components/format/number';
import { lastSocket, sockets } from '@/components/realtime/test-socket';
import { renderRoutes } from '@/components/test-router';
import { sessionAs } from '@/components/test-utils';
import { GrowthOrderScreen } from './growth-order-screen';
import { detail, ids, report, routeFetch, withReport, type Reply } from './test-fixtures';

jest.mock('@/components/charts/series-plot', () => jest.requireActual('@/components/charts/test-series-plot'));
jest.mock('socket.io-client', () => jest.requireActual('@/components/realtime/test-socket'));

const routes = {
  'growth/[id]': GrowthOrderScreen,
  'growth/index': () => <Text>Orders</Text>,
  'runs/[id]': () => <Text>Run page</Text>,
};

const orderUrl = `/api/growth-orders/${ids.order}`;
const ok = (body: unknown): Reply => ({ status: 200, body });

function show(d: GrowthOrderDetail | (() => GrowthOrderDetail), role: Role, extra: Record<string, Reply | ((req: { body: unknown }) => Reply)> = {}) {
  const fetched = routeFetch({ [`GET ${orderUrl}`]: () => ok(typeof d === 'function' ? d() : d), ...extra });
  renderRoutes(routes, `/growth/${ids.order}`, sessionAs(role));
  return fetched;
}

const button = (name: string | RegExp) => screen.queryByRole('button', { name });

afterEach(() => {
  sockets.length = 0;
});

describe('GrowthOrderScreen: who may do what', () => {
  it('a grower gets the next step and the upload, not the verdict or the sheet settings', async () => {
    show(detail('requested'), 'grower');
    expect(await screen.findByTestId('growth-sheet')).toBeOnTheScreen();
    expect(button('Accept the order')).toBeOnTheScreen();
    expect(button('Choose CSV file')).toBeOnTheScreen();
    expect(screen.queryByTestId('close-order')).toBeNull();
    expect(screen.queryByTestId('sheet-settings')).toBeNull();
  });

  it('a physicist gets the verdict and the sheet settings, not the grower step or the upload; approval waits for a measurement', async () => {
    show(detail('growing'), 'physicist');
    expect(await screen.findByTestId('close-order')).toBeOnTheScreen();
    expect(screen.getByTestId('sheet-settings')).toBeOnTheScreen();
    expect(button(/^(Accept the order|Start growing|Mark as grown|Mark as measured)$/)).toBeNull();
    expect(button('Choose CSV file')).toBeNull();
    expect(screen.getByTestId('verdict-approved')).toBeDisabled();
    expect(screen.getByTestId('verdict-rejected')).not.toBeDisabled();
  });

  it('a viewer reads the sheet and its exports and can change nothing', async () => {
    show(withReport('measured'), 'viewer');
    expect(await screen.findByTestId('growth-sheet')).toBeOnTheScreen();
    expect(screen.getByText('CSV')).toBeOnTheScreen();
    expect(screen.getByText('JSON')).toBeOnTheScreen();
    expect(screen.getByTestId('measurement-report')).toBeOnTheScreen();
    for (const id of ['advance-order', 'close-order', 'sheet-settings', 'measurement-upload']) expect(screen.queryByTestId(id)).toBeNull();
  });

  it('nobody acts on a closed order; its verdict and reason are shown', async () => {
    show(detail('rejected'), 'admin');
    expect(await screen.findByTestId('close-reason')).toHaveTextContent(/Rejected: reason.*Zone 2 over-doped/);
    for (const id of ['advance-order', 'close-order', 'sheet-settings', 'measurement-upload']) expect(screen.queryByTestId(id)).toBeNull();
    expect(screen.getByTestId('order-state')).toHaveTextContent(/Rejected/);
  });

  it('another team’s order (404) says so and offers no retry', async () => {
    show(detail(), 'physicist', { [`GET ${orderUrl}`]: { status: 404, body: { name: 'NotFound', message: 'growth order not found' } } });
    expect(await screen.findByText('This order is not in your team')).toBeOnTheScreen();
    expect(button('Try again')).toBeNull();
  });
});

describe('GrowthOrderScreen: the report', () => {
  it('shows the predicted ΔT against the target, each zone verdict in words and the flagged zone', async () => {
    const r = report();
    show(withReport('measured'), 'physicist');
    const predicted = await screen.findByTestId('report-design-current');
    // A string must match the whole text: look for the number and its unit inside it.
    const k = (v: number) => new RegExp(`${formatNumber(v, 3).replace('.', '\\.')}\\sK`);
    expect(predicted).toHaveTextContent(k(r.asGrown.atDesignCurrent.deltaT));
    const gap = r.asGrown.atDesignCurrent.deltaT - r.target.deltaT;
    expect(predicted).toHaveTextContent(new RegExp(`${gap < 0 ? '−' : '\\+'}${formatNumber(Math.abs(gap), 3).replace('.', '\\.')}\\sK vs target`));
    expect(screen.getByTestId('report-target')).toHaveTextContent(k(r.target.deltaT));
    expect(screen.getByTestId('report-best-current')).toHaveTextContent(k(r.asGrown.atBestCurrent.deltaT));
    for (const v of r.verdicts) {
      const word = { within: 'Within band', high: 'Above band', low: 'Below band', unmeasured: 'Not measured' }[v.verdict];
      expect(screen.getByTestId(`verdict-${v.zone + 1}`)).toHaveTextContent(new RegExp(`Zone ${v.zone + 1}.*${word}`));
    }
    const flagged = r.verdicts.filter((v) => v.verdict === 'high').map((v) => `zone ${v.zone + 1} above band`);
    expect(screen.getByTestId('report-summary')).toHaveTextContent(new RegExp(`Zones out of tolerance.*${flagged.join('.*')}`));
    expect(screen.getByTestId('report-warnings')).toHaveTextContent(new RegExp(r.warnings[0].replace(/[.()]/g, (c) => `\\${c}`)));
    expect(within(screen.getByTestId('report-plot')).getByTestId('series-plot')).toHaveTextContent(
      new RegExp(`Carrier concentration n \\(cm⁻³\\) vs Position from the cold end x \\(mm\\).*Target:${2 * r.zones}.*As grown \\(inferred\\):${r.points.length}\\+${r.points.length}`),
    );
  });
});

describe('GrowthOrderScreen: the Hall factor on a report', () => {
  it('states the factor the report used; a report without Hall values says nothing of it', async () => {
    const note = 'Hall factor from the band model (one parabolic band, acoustic-phonon scattering, at each point’s Fermi level): r_H = 1.046–1.118; carrier concentration = r_H × Hall concentration.';
    const withHall = withReport('measured');
    withHall.measurements[0]!.report = { ...report(), hall: { source: 'band-model', min: 1.046, max: 1.118, note } } as unknown as Record<string, unknown>;
    show(withHall, 'physicist');
    expect(await screen.findByTestId('report-hall')).toHaveTextContent(/Hall factor used.*r_H = 1\.046–1\.118/);
  });

  it('has no Hall notice without Hall values', async () => {
    show(withReport('measured'), 'physicist');
    expect(await screen.findByTestId('measurement-report')).toBeOnTheScreen();
    expect(screen.queryByTestId('report-hall')).toBeNull();
  });
});

describe('GrowthOrderScreen: actions', () => {
  it('the grower moves the order one step with a note', async () => {
    let current = detail('requested');
    const { requests } = show(() => current, 'grower', {
      [`PUT ${orderUrl}/state`]: () => {
        current = detail('accepted');
        return ok(current);
      },
    });
    fireEvent.changeText(await screen.findByTestId('field-state-note'), 'Furnace B booked');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Accept the order' })));
    expect(requests.find((r) => r.method === 'PUT')).toMatchObject({ url: `${orderUrl}/state`, body: { state: 'accepted', note: 'Furnace B booked' } });
    await waitFor(() => expect(screen.getByTestId('order-state')).toHaveTextContent(/Accepted/));
    expect(screen.getByRole('button', { name: 'Start growing' })).toBeOnTheScreen();
  });

  it('the physicist must give a reason to close, then rejects', async () => {
    const { requests } = show(detail('grown'), 'physicist', { [`POST ${orderUrl}/close`]: () => ok(detail('rejected')) });
    await act(async () => fireEvent.press(await screen.findByRole('button', { name: 'Close as rejected' })));
    expect(screen.getByTestId('error-close-reason')).toHaveTextContent(/Give a reason/);
    expect(requests.some((r) => r.method === 'POST')).toBe(false);
    fireEvent.changeText(screen.getByTestId('field-close-reason'), 'Boule cracked in zone 1.');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Close as rejected' })));
    expect(requests.find((r) => r.method === 'POST')).toMatchObject({ body: { verdict: 'rejected', reason: 'Boule cracked in zone 1.' } });
    expect(await screen.findByTestId('close-reason')).toBeOnTheScreen();
  });

  it('a change refused because the order was closed meanwhile reloads it: the verdict shows, the actions go', async () => {
    let current = detail('grown');
    show(() => current, 'physicist', {
      [`PUT ${orderUrl}/sheet`]: () => {
        current = detail('rejected');
        return { status: 409, body: { name: 'Conflict', message: 'The order is closed (rejected).', errors: [{ field: 'state', message: 'closed: rejected' }] } };
      },
    });
    fireEvent.changeText(await screen.findByTestId('field-loss-budget'), '2');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Apply settings' })));
    await waitFor(() => expect(screen.getByTestId('order-state')).toHaveTextContent(/Rejected/));
    for (const id of ['close-order', 'sheet-settings']) expect(screen.queryByTestId(id)).toBeNull();
  });

  it('refreshes the order when the team room says it changed', async () => {
    let current = detail('requested');
    show(() => current, 'viewer');
    await screen.findByTestId('growth-sheet');
    act(() => lastSocket().serverConnect());
    current = detail('growing');
    act(() => lastSocket().serverEmit('growth:changed', { orderId: ids.order }));
    await waitFor(() => expect(screen.getByTestId('order-state')).toHaveTextContent(/Growing/));
  });
});

describe('GrowthOrderScreen: joint bands and the yield', () => {
  it('says how the bands were computed, shows the yield with its scatter, and lets the grower recompute it at another scatter', async () => {
    const fetched = show(detail('growing'), 'grower', {
      [`PUT ${orderUrl}/yield`]: (req) => ok({ ...detail('growing'), order: { ...detail('growing').order, dopingScatter: (req.body as { dopingScatter: number }).dopingScatter, yieldStatus: 'computing', sheetProgress: 0.4 } }),
    });
    const note = await screen.findByTestId('band-note');
    expect(within(note).getByText(/computed jointly: every combination inside the bands keeps the loss ≤ 1 K \(corners re-solved: 8, all of them/)).toBeOnTheScreen();
    expect(screen.getByTestId('yield-percent')).toHaveTextContent('97.7 %');
    expect(screen.getByTestId('yield-note')).toHaveTextContent(/of 600 simulated as-grown legs lose ≤ 1 K at a doping scatter of 0.05 decades \(1σ\) per zone/);
    fireEvent.changeText(screen.getByLabelText(/Doping scatter per zone/), '2');
    fireEvent.press(screen.getByRole('button', { name: 'Recompute yield' }));
    expect(await screen.findByText('Doping scatter per zone (1σ) must be 0–1 decade')).toBeOnTheScreen();
    expect(fetched.requests.some((r) => r.method === 'PUT')).toBe(false);
    fireEvent.changeText(screen.getByLabelText(/Doping scatter per zone/), '0.12');
    fireEvent.press(screen.getByRole('button', { name: 'Recompute yield' }));
    expect(await screen.findByText(/Yield at 0.12 decades of doping scatter — recomputing \(40 %\)/)).toBeOnTheScreen();
    expect(fetched.requests.find((r) => r.method === 'PUT')!.body).toEqual({ dopingScatter: 0.12 });
    expect(screen.getByTestId('yield-stale')).toHaveTextContent('Shown for 0.05 decades until the yield at 0.12 decades is ready.');
  });

  it('a viewer sees the yield but no scatter form', async () => {
    show(detail('growing'), 'viewer');
    expect(await screen.findByTestId('yield-block')).toBeOnTheScreen();
    expect(screen.queryByTestId('scatter-settings')).toBeNull();
  });
});
