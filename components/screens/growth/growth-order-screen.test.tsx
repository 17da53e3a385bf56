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
      const word = { within: 'Within band', high: 'Above band', low: 'Below band', stray: 'Readings outside band', unmeasured: 'Not measured' }[v.verdict];
      expect(screen.getByTestId(`verdict-${v.zone + 1}`)).toHaveTextContent(new RegExp(`Zone ${v.zone + 1}.*${word}.*${v.readingsOutside ? `${v.readingsOutside} of ${v.readings} readings outside` : `all ${v.readings} readings inside`} its band`));
    }
    // Zone 3's mean is on target, but one reading is not: it does not read "Within band".
    expect(screen.getByTestId('verdict-3')).not.toHaveTextContent(/Within band/);
    expect(screen.getByTestId('verdict-readings-3')).toHaveTextContent('1 of 2 readings outside its band');
    const flagged = r.verdicts.filter((v) => v.verdict === 'high').map((v) => `zone ${v.zone + 1} above band`);
    expect(screen.getByTestId('report-summary')).toHaveTextContent(new RegExp(`Zones out of tolerance.*${flagged.join('.*')}`));
    expect(screen.getByTestId('report-warnings')).toHaveTextContent(new RegExp(r.warnings[0].replace(/[.()]/g, (c) => `\\${c}`)));
    expect(within(screen.getByTestId('report-plot')).getByTestId('series-plot')).toHaveTextContent(
      new RegExp(`Carrier concentration n \\(cm⁻³\\) vs Position from the cold end x \\(mm\\).*Target:${2 * r.zones}.*As grown \\(inferred\\):${r.points.length}\\+${r.points.length}.*Reading outside its band:0\\+2`),
    );
  });
});

describe('GrowthOrderScreen: each measurement against its band', () => {
  it('lists every position with each reading, its band and a verdict in words; a position outside its band is flagged', async () => {
    show(withReport('measured'), 'grower');
    const stray = await screen.findByTestId('reading-row-4');
    expect(stray).toHaveTextContent(/1\.8\smm.*312\sµV\/K.*above band 246–304\sµV\/K.*310\sS\/cm.*within band 306–603\sS\/cm/);
    expect(stray).toHaveTextContent(/Outside band: S above/);
    expect(screen.getByTestId('reading-row-3')).toHaveTextContent(/Outside band: S below, σ above/);
    expect(screen.getByTestId('reading-row-2')).toHaveTextContent(/Within band/);
    expect(screen.getByTestId('reading-row-2')).not.toHaveTextContent(/Outside/);
    expect(screen.getByTestId('report-summary')).toHaveTextContent(/2 of 3 positions have a reading outside its zone's band/);
    expect(screen.getByTestId('report-csv')).toHaveTextContent('Report CSV');
  });

  it('a report stored before readings were judged says it was judged zone by zone only', async () => {
    const old = withReport('measured');
    const r = report();
    old.measurements[0]!.report = {
      ...r,
      points: r.points.map(({ zone: _zone, readings: _readings, ...p }) => p),
      verdicts: r.verdicts.map(({ readings: _r, readingsOutside: _o, ...v }) => ({ ...v, verdict: v.verdict === 'stray' ? 'within' : v.verdict })),
    } as unknown as Record<string, unknown>;
    show(old, 'physicist');
    expect(await screen.findByTestId('report-summary')).toHaveTextContent(/Judged zone by zone only: this upload predates the check of each reading/);
    expect(screen.getByTestId('reading-row-4')).toHaveTextContent(/1\.8\smm/);
    expect(screen.queryByTestId('verdict-readings-3')).toBeNull();
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

  it('closing has no verdict chosen: the physicist picks one, gives a reason, confirms, then it closes', async () => {
    const { requests } = show(detail('grown'), 'physicist', { [`POST ${orderUrl}/close`]: () => ok(detail('rejected')) });
    expect(await screen.findByTestId('close-choose')).toHaveTextContent('Choose Approve or Reject first.');
    expect(screen.getByTestId('verdict-rejected')).not.toBeChecked();
    expect(screen.getByTestId('verdict-approved')).not.toBeChecked();
    expect(button(/^Close as/)).toBeNull();
    expect(button('Close the order')).toBeDisabled();
    fireEvent.press(screen.getByTestId('verdict-rejected'));
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Close as rejected' })));
    expect(screen.getByTestId('error-close-reason')).toHaveTextContent(/Give a reason for rejecting/);
    expect(requests.some((r) => r.method === 'POST')).toBe(false);
    fireEvent.changeText(screen.getByTestId('field-close-reason'), 'Boule cracked in zone 1.');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Close as rejected' })));
    // One more question before an irreversible step; "Keep" goes back without sending.
    expect(screen.getByTestId('close-confirm')).toHaveTextContent(/Close the order as rejected\?.*closes for good.*e-mailed/);
    expect(requests.some((r) => r.method === 'POST')).toBe(false);
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Yes, close as rejected' })));
    expect(requests.find((r) => r.method === 'POST')).toMatchObject({ body: { verdict: 'rejected', reason: 'Boule cracked in zone 1.' } });
    expect(await screen.findByTestId('close-reason')).toBeOnTheScreen();
  });

  it('a measured order is not pre-set to approve either; approving asks for a reason and confirmation too', async () => {
    const { requests } = show(withReport('measured'), 'physicist', { [`POST ${orderUrl}/close`]: () => ok(detail('rejected')) });
    expect(await screen.findByTestId('close-choose')).toBeOnTheScreen();
    expect(screen.getByTestId('verdict-approved')).not.toBeChecked();
    fireEvent.press(screen.getByTestId('verdict-approved'));
    expect(screen.getByTestId('verdict-approved')).toBeChecked();
    fireEvent.changeText(screen.getByTestId('field-close-reason'), 'Within band; go ahead.');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Close as approved' })));
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Keep' })));
    expect(requests.some((r) => r.method === 'POST')).toBe(false);
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Close as approved' })));
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Yes, close as approved' })));
    expect(requests.find((r) => r.method === 'POST')).toMatchObject({ body: { verdict: 'approved', reason: 'Within band; go ahead.' } });
  });

  it('"Mark as measured" stays disabled until a measurement is uploaded, and says why', async () => {
    show(detail('grown'), 'grower');
    expect(await screen.findByRole('button', { name: 'Mark as measured' })).toBeDisabled();
    expect(screen.getByTestId('advance-blocker')).toHaveTextContent(/No measurements yet.*opens once the as-grown measurements are uploaded/);
  });

  it('"Mark as measured" is enabled once an upload is in', async () => {
    show(withReport('grown'), 'grower');
    expect(await screen.findByRole('button', { name: 'Mark as measured' })).not.toBeDisabled();
    expect(screen.queryByTestId('advance-blocker')).toBeNull();
  });

  it('"Start growing" waits for the growth sheet', async () => {
    const computing = detail('accepted');
    computing.order = { ...computing.order, sheetStatus: 'computing' };
    computing.sheet = null;
    show(computing, 'grower');
    expect(await screen.findByRole('button', { name: 'Start growing' })).toBeDisabled();
    expect(screen.getByTestId('advance-blocker')).toHaveTextContent(/Growth sheet not ready/);
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
