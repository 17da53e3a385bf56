import { Text } from 'react-native';
import { act, fireEvent, screen, waitFor } from 'expo-router/testing-library';
import { renderRoutes } from '@/components/test-router';
import { mockFetch, sessionAs } from '@/components/test-utils';
import { bandDetail, bandId, familySummary } from '../test-fixtures';
import { EditFamilyScreen } from './edit-family-screen';
import { NewFamilyScreen } from './new-family-screen';

const routes = {
  index: () => <Text>Materials list</Text>,
  'materials/new': NewFamilyScreen,
  'materials/[id]/index': () => <Text>Family page</Text>,
  'materials/[id]/edit': EditFamilyScreen,
};

const type = (id: string, text: string) => fireEvent.changeText(screen.getByTestId(`field-${id}`), text);

function fillValidBand() {
  fireEvent.press(screen.getByTestId('carrier-n'));
  type('effectiveMass', '1.1');
  type('mobility300', '300');
  type('latticeKappa300', '1.3');
  type('name', 'Ingot 9 n-type fit');
  type('source', 'Hall and Seebeck on 6 bars, ingot 9');
}

describe('NewFamilyScreen', () => {
  it('checks fields before sending and shows each problem beside its field', async () => {
    const { calls } = mockFetch({ status: 500, body: { name: 'Unexpected', message: 'should not be called' } });
    renderRoutes(routes, '/materials/new', sessionAs('physicist'));
    type('effectiveMass', '0');
    type('mobility300', 'abc');
    fireEvent.press(screen.getByRole('button', { name: 'Create family' }));

    expect(await screen.findByTestId('error-effectiveMass')).toHaveTextContent('Effective mass must be greater than 0');
    expect(screen.getByTestId('error-mobility300')).toHaveTextContent('Mobility at 300 K must be a finite number');
    expect(screen.getByTestId('error-latticeKappa300')).toHaveTextContent('Lattice thermal conductivity at 300 K is required');
    expect(screen.getByTestId('error-name')).toHaveTextContent('Name is required');
    expect(screen.getByTestId('error-source')).toHaveTextContent(/Source is required/);
    expect(screen.queryByTestId('error-mobilityExponent')).toBeNull();
    expect(screen.getByTestId('form-problems')).toHaveTextContent(
      'Fix before saving: Name, Source, Effective mass, Mobility at 300 K, Lattice thermal conductivity at 300 K.',
    );
    expect(calls).toEqual([]);

    // Errors follow the typing once shown.
    type('effectiveMass', '1.1');
    expect(screen.queryByTestId('error-effectiveMass')).toBeNull();
  });

  it('posts the band model and opens the new family', async () => {
    const created = familySummary({ id: '44444444-4444-4444-8444-444444444444', carrier: 'n', version: 1 });
    const { requests } = mockFetch({ status: 201, body: { family: created } });
    const result = renderRoutes(routes, '/materials/new', sessionAs('physicist'));
    fillValidBand();
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Create family' })));

    await waitFor(() => expect(result.getPathname()).toBe(`/materials/${created.id}`));
    expect(requests[0]).toEqual({
      method: 'POST',
      url: '/api/families',
      body: {
        name: 'Ingot 9 n-type fit',
        summary: '',
        source: 'Hall and Seebeck on 6 bars, ingot 9',
        definition: { kind: 'band', carrier: 'n', effectiveMass: 1.1, mobility300: 300, mobilityExponent: -1.5, latticeKappa300: 1.3, latticeKappaExponent: -1 },
      },
    });
  });

  it('puts the server’s field errors beside the fields', async () => {
    mockFetch({
      status: 400,
      body: {
        name: 'ValidationError',
        message: 'The family was not saved: 2 fields need attention.',
        errors: [
          { field: 'definition.effectiveMass', message: 'effectiveMass above 100 is implausible: the effective mass is in units of the free-electron mass' },
          { field: 'name', message: 'a family with this name exists already' },
        ],
      },
    });
    renderRoutes(routes, '/materials/new', sessionAs('physicist'));
    fillValidBand();
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Create family' })));

    expect(await screen.findByTestId('form-server-error')).toHaveTextContent(/The family was not saved/);
    expect(screen.getByTestId('error-effectiveMass')).toHaveTextContent(/^Effective mass above 100 is implausible/);
    expect(screen.getByTestId('error-name')).toHaveTextContent('a family with this name exists already');
  });

  it('is read-only for a grower', async () => {
    mockFetch({ status: 500, body: {} });
    renderRoutes(routes, '/materials/new', sessionAs('grower'));
    expect(await screen.findByTestId('write-guard')).toHaveTextContent(/you are signed in as grower/);
    expect(screen.queryByRole('button', { name: 'Create family' })).toBeNull();
  });
});

describe('EditFamilyScreen', () => {
  it('explains the next version, then saves the changed model with PUT', async () => {
    const { requests } = mockFetch(
      { status: 200, body: bandDetail({ runCount: 2 }) },
      { status: 200, body: { family: familySummary({ version: 4 }) } },
    );
    const result = renderRoutes(routes, `/materials/${bandId}/edit`, sessionAs('physicist'));

    const notice = await screen.findByTestId('version-notice');
    expect(notice).toHaveTextContent(/Saving creates version 4/);
    expect(notice).toHaveTextContent(/Version 3 stays exactly as it is: it is locked, and the 2 runs that used it keep pointing at it/);
    expect(screen.getByTestId('field-mobility300').props.value).toBe('280');

    type('mobility300', '295');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Save changes' })));

    await waitFor(() => expect(result.getPathname()).toBe(`/materials/${bandId}`));
    expect(requests[1]).toMatchObject({ method: 'PUT', url: `/api/families/${bandId}` });
    expect(requests[1].body).toMatchObject({ name: 'Graded p-leg model', definition: { mobility300: 295, effectiveMass: 1.2 } });
  });
});
