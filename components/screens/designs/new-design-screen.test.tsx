import { Text } from 'react-native';
import { act, fireEvent, screen, waitFor, within } from 'expo-router/testing-library';
import { renderRoutes } from '@/components/test-router';
import { sessionAs } from '@/components/test-utils';
import { design, familiesResponse, familyDetail, ids, routeFetch, type Reply, type SentRequest } from '../runs/test-fixtures';
import { NewDesignScreen } from './new-design-screen';

// The quick estimate runs the engine in the test (band tables on first use): room for a busy machine.
jest.setTimeout(30_000);

const routes = {
  'designs/new': NewDesignScreen,
  'designs/index': () => <Text>Designs list</Text>,
  'designs/[id]/index': () => <Text>Design page</Text>,
};

function open(post?: (req: SentRequest) => Reply, role: 'physicist' | 'viewer' = 'physicist') {
  const fetched = routeFetch({
    'GET /api/families': { status: 200, body: familiesResponse() },
    [`GET /api/families/${ids.family}`]: { status: 200, body: familyDetail() },
    ...(post ? { 'POST /api/designs': post } : {}),
  });
  const result = renderRoutes(routes, '/designs/new', sessionAs(role));
  return { ...fetched, result };
}

const field = (id: string) => screen.getByTestId(`field-${id}`);
const errorOf = (id: string) => screen.queryByTestId(`error-${id}`);
const posts = (requests: SentRequest[]) => requests.filter((r) => r.method === 'POST');

async function chooseFamily() {
  fireEvent.press(await screen.findByRole('radio', { name: 'Test p-type band model (p)' }));
}

describe('NewDesignScreen', () => {
  it('offers only gradable families, with carrier and version', async () => {
    open();
    await chooseFamily();
    expect(screen.queryByRole('radio', { name: /Reference constant leg/ })).toBeNull();
    expect(screen.getByText(/p-type · version 2 \(current\)/)).toBeOnTheScreen();
  });

  it('marks missing and out-of-range fields beside them and sends nothing', async () => {
    const { requests } = open();
    await screen.findByRole('radio', { name: 'Test p-type band model (p)' });
    fireEvent.changeText(field('lengthMm'), '');
    fireEvent.changeText(field('hotSide'), '3000');
    fireEvent.changeText(field('minPerCm3'), '1e12');
    fireEvent.press(screen.getByRole('button', { name: 'Save design' }));

    expect(errorOf('name')).toHaveTextContent('Name is required');
    expect(errorOf('familyId')).toHaveTextContent('Choose a material family');
    expect(errorOf('lengthMm')).toHaveTextContent('Leg length L is required');
    expect(errorOf('hotSide')).toHaveTextContent(/Hot-side temperature Th above 1000 K is implausible \(temperatures are in kelvin\)/);
    expect(errorOf('minPerCm3')).toHaveTextContent(/at least 1e14 cm⁻³.*10⁶ too large/);
    expect(screen.getByTestId('form-problem-count')).toHaveTextContent('5 fields need attention before saving.');
    expect(posts(requests)).toEqual([]);

    // Errors follow the typing once the form has been tried.
    fireEvent.changeText(field('hotSide'), '300');
    expect(errorOf('hotSide')).toBeNull();
  });

  it('asks for the cold-side target only for the objectives that need it, and checks it against Th', async () => {
    open();
    await chooseFamily();
    expect(screen.queryByTestId('field-coldSide')).toBeNull();
    fireEvent.press(screen.getByRole('radio', { name: 'Largest heat load' }));
    expect(screen.queryByTestId('field-heatLoad')).toBeNull();
    fireEvent.changeText(field('name'), 'Heat-load leg');
    fireEvent.press(screen.getByRole('button', { name: 'Save design' }));
    expect(errorOf('coldSide')).toHaveTextContent('Cold-side target Tc is required for the heat-load and COP objectives');
    fireEvent.changeText(field('coldSide'), '320');
    expect(errorOf('coldSide')).toHaveTextContent('Cold-side target Tc must be below Hot-side temperature Th');
    fireEvent.changeText(field('maxPerCm3'), '1e17');
    expect(errorOf('maxPerCm3')).toHaveTextContent('Highest doping must be greater than Lowest doping');
  });

  it('shows the server’s field errors beside the fields', async () => {
    const refuse = (): Reply => ({
      status: 400,
      body: { name: 'ValidationError', message: 'The design was not saved.', errors: [{ field: 'minPerCm3', message: 'bounds.minPerCm3: is below the table’s lowest doping 1e+18 cm⁻³' }] },
    });
    open(refuse);
    await chooseFamily();
    fireEvent.changeText(field('name'), 'Too lightly doped');
    fireEvent.press(screen.getByRole('button', { name: 'Save design' }));
    expect(await screen.findByTestId('form-server-error')).toHaveTextContent(/Not saved.*The design was not saved\./);
    expect(errorOf('minPerCm3')).toHaveTextContent('Lowest doping: is below the table’s lowest doping 1e+18 cm⁻³');
  });

  it('sends the design in the trade’s units and opens its page', async () => {
    const { requests, result } = open(() => ({ status: 201, body: { design: design({ name: 'Stage leg' }) } }));
    await chooseFamily();
    fireEvent.changeText(field('name'), 'Stage leg');
    fireEvent.changeText(field('lengthMm'), '1,2');
    fireEvent.changeText(field('maxPerCm3'), '2×10^20');
    fireEvent.changeText(field('starts'), '120');
    fireEvent.press(screen.getByTestId('field-monotone'));
    fireEvent.press(screen.getByRole('button', { name: 'Save design' }));
    await waitFor(() => expect(result.getPathname()).toBe(`/designs/${ids.design}`));
    expect(posts(requests)[0]?.body).toEqual({
      name: 'Stage leg', notes: '', familyId: ids.family, objective: 'maxDeltaT', lengthMm: 1.2, areaMm2: 1, hotSide: 300, heatLoad: 0,
      minPerCm3: 1e18, maxPerCm3: 2e20, controlPoints: 11, monotone: true, starts: 120, minZoneMm: 0,
      // Ideal contacts and no parasitic heat unless the physicist says otherwise.
      coldContactMicroOhmCm2: 0, hotContactMicroOhmCm2: 0, parasitic: 'none', parasiticLoadW: 0, emissivity: 0,
    });
  });

  it('sends each junction’s contact in µΩ·cm² and the parasitic heat the physicist chose', async () => {
    const { requests, result } = open(() => ({ status: 201, body: { design: design({ name: 'Real leg' }) } }));
    await chooseFamily();
    fireEvent.changeText(field('name'), 'Real leg');
    fireEvent.changeText(field('coldContactMicroOhmCm2'), '5');
    fireEvent.changeText(field('hotContactMicroOhmCm2'), '2,5');
    fireEvent.press(screen.getByTestId('parasitic-radiation'));
    fireEvent.press(screen.getByRole('button', { name: 'Save design' }));
    // Radiation needs both of its numbers: said beside each field, nothing sent.
    expect(await screen.findByTestId('error-emissivity')).toHaveTextContent('Emissivity ε must be greater than 0 for radiation');
    expect(errorOf('surroundingsK')).toHaveTextContent(/^Surroundings Ts is required/);
    expect(posts(requests)).toEqual([]);
    fireEvent.press(screen.getByTestId('parasitic-fixed'));
    fireEvent.changeText(field('parasiticLoadW'), '0.002');
    fireEvent.press(screen.getByRole('button', { name: 'Save design' }));
    await waitFor(() => expect(result.getPathname()).toBe(`/designs/${ids.design}`));
    expect(posts(requests)[0]?.body).toMatchObject({ coldContactMicroOhmCm2: 5, hotContactMicroOhmCm2: 2.5, parasitic: 'fixed', parasiticLoadW: 0.002, emissivity: 0 });
  });

  it('estimates the best uniform leg in the browser, and says when the values have changed', async () => {
    const { requests } = open();
    await chooseFamily();
    const estimate = await screen.findByTestId('quick-estimate');
    const button = within(estimate).getByRole('button', { name: 'Quick estimate' });
    await waitFor(() => expect(button).not.toBeDisabled());
    fireEvent.press(button);
    const uniform = await screen.findByTestId('estimate-uniform', {}, { timeout: 10_000 });
    const deltaT = Number(/ΔT ≈ ([\d.]+)\sK/.exec(String(uniform.props.children))?.[1]);
    // A leg cooled by a bismuth-telluride-like material at 300 K: tens of kelvin, well below Th.
    expect(deltaT).toBeGreaterThan(20);
    expect(deltaT).toBeLessThan(150);
    expect(uniform).toHaveTextContent(/at [\d.]+\sA$/);
    expect(screen.getByTestId('estimate-two-node')).toHaveTextContent(/two-node graded leg ≈ [\d.]+\sK \(\+/);
    expect(posts(requests)).toEqual([]);
    fireEvent.changeText(field('hotSide'), '310');
    expect(screen.getByText('The values changed since this estimate: estimate again.')).toBeOnTheScreen();
  });

  it('keeps a viewer out of the form', async () => {
    open(undefined, 'viewer');
    expect(await screen.findByTestId('write-guard')).toHaveTextContent(/physicists and admins; you are signed in as viewer/);
    expect(screen.queryByRole('button', { name: 'Save design' })).toBeNull();
    await act(async () => undefined);
  });
});
