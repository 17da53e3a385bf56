import { Text } from 'react-native';
import { act, fireEvent, screen, waitFor } from 'expo-router/testing-library';
import { renderRoutes } from '@/components/test-router';
import { sessionAs } from '@/components/test-utils';
import { routeFetch } from '@/components/screens/runs/test-fixtures';
import { DeleteCooler } from './delete-cooler';
import { cascadeCooler, coolerIds } from './test-fixtures';

const id = coolerIds.cascade;
const cooler = cascadeCooler();
const routes = { 'stages/[id]': () => <DeleteCooler cooler={cooler} finishedRuns={2} />, 'stages/index': () => <Text>Stages list</Text> };

describe('DeleteCooler', () => {
  it('says what goes with it, asks once more, deletes, and goes back to Stages', async () => {
    const { requests } = routeFetch({ [`DELETE /api/coolers/${id}`]: { status: 204, body: null } });
    const result = renderRoutes(routes, `/stages/${id}`, sessionAs('admin'));
    fireEvent.press(screen.getByTestId('cooler-delete'));
    expect(screen.getByTestId('confirm-delete-cooler')).toHaveTextContent(new RegExp(`Delete the cascade “${cooler.name}”\\?`));
    expect(screen.getByTestId('confirm-delete-cooler')).toHaveTextContent(/its 2 finished runs go/);
    expect(requests).toHaveLength(0);
    await act(async () => fireEvent.press(screen.getByTestId('confirm')));
    await waitFor(() => expect(result.getPathname()).toBe('/stages'));
    expect(requests.map((r) => `${r.method} ${r.url}`)).toEqual([`DELETE /api/coolers/${id}`]);
  });

  it('shows the server’s refusal (a run still going) and stays', async () => {
    routeFetch({ [`DELETE /api/coolers/${id}`]: { status: 409, body: { name: 'Conflict', message: 'The cooler has 1 run queued or running; cancel it before deleting the cooler.', errors: [{ field: 'runs', message: '1 unfinished' }] } } });
    const result = renderRoutes(routes, `/stages/${id}`, sessionAs('admin'));
    fireEvent.press(screen.getByTestId('cooler-delete'));
    await act(async () => fireEvent.press(screen.getByTestId('confirm')));
    await waitFor(() => expect(screen.getByTestId('cooler-delete-error')).toHaveTextContent(/cancel it before deleting/));
    expect(result.getPathname()).toBe(`/stages/${id}`);
  });

  it('is offered to admins only, as the server rules', () => {
    routeFetch({});
    for (const role of ['physicist', 'grower', 'viewer'] as const) {
      const view = renderRoutes(routes, `/stages/${id}`, sessionAs(role));
      expect(screen.queryByTestId('cooler-delete')).toBeNull();
      view.unmount();
    }
  });
});
