import { Text } from 'react-native';
import { act, fireEvent, screen, waitFor } from 'expo-router/testing-library';
import { renderRoutes } from '@/components/test-router';
import { sessionAs } from '@/components/test-utils';
import { routeFetch } from '@/components/screens/runs/test-fixtures';
import { DeleteModule } from './delete-module';
import { moduleDesign } from './module-fixtures';

const id = 'aaaaaaaa-aaaa-4aaa-8aaa-aaaaaaaaaaaa';
const saved = moduleDesign(id, 'Detector stage', 31);
const routes = { 'modules/[id]': () => <DeleteModule module={saved} />, 'modules/index': () => <Text>Modules list</Text> };

describe('DeleteModule', () => {
  it('asks once more, deletes, and goes back to the list', async () => {
    const { requests } = routeFetch({ [`DELETE /api/modules/${id}`]: { status: 204, body: null } });
    const result = renderRoutes(routes, `/modules/${id}`, sessionAs('physicist'));
    fireEvent.press(screen.getByTestId('module-delete'));
    expect(screen.getByTestId('confirm-delete-module')).toHaveTextContent(/Delete the module “Detector stage”\?/);
    expect(requests).toHaveLength(0);
    await act(async () => fireEvent.press(screen.getByTestId('confirm')));
    await waitFor(() => expect(result.getPathname()).toBe('/modules'));
    expect(requests.map((r) => `${r.method} ${r.url}`)).toEqual([`DELETE /api/modules/${id}`]);
  });

  it('keeps the module when the second step is declined', () => {
    const { requests } = routeFetch({});
    renderRoutes(routes, `/modules/${id}`, sessionAs('physicist'));
    fireEvent.press(screen.getByTestId('module-delete'));
    fireEvent.press(screen.getByTestId('cancel'));
    expect(screen.getByTestId('module-delete')).toBeOnTheScreen();
    expect(requests).toHaveLength(0);
  });

  it('is not offered to a viewer', () => {
    routeFetch({});
    renderRoutes(routes, `/modules/${id}`, sessionAs('viewer'));
    expect(screen.queryByTestId('module-delete')).toBeNull();
  });
});
