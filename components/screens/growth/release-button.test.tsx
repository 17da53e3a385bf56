import { Text } from 'react-native';
import { act, fireEvent, screen, waitFor } from 'expo-router/testing-library';
import type { Role } from '@/shared/api/auth';
import { renderRoutes } from '@/components/test-router';
import { sessionAs } from '@/components/test-utils';
import { ReleaseButton } from './release-button';
import { ids, order, routeFetch, type Reply } from './test-fixtures';

const routes = {
  'runs/[id]': () => <ReleaseButton runId={ids.run} />,
  'growth/[id]': () => <Text>Order page</Text>,
};

const releaseUrl = `POST /api/runs/${ids.run}/release`;

function show(role: Role, reply: Reply = { status: 201, body: { order: order() } }) {
  const fetched = routeFetch({ [releaseUrl]: reply });
  const result = renderRoutes(routes, `/runs/${ids.run}`, sessionAs(role));
  return { ...fetched, result };
}

describe('ReleaseButton', () => {
  it.each<Role>(['grower', 'viewer'])('is not offered to a %s', (role) => {
    show(role);
    expect(screen.queryByRole('button', { name: 'Release to grower' })).toBeNull();
  });

  it('checks the form with the API’s rules before sending anything', async () => {
    const { requests } = show('physicist');
    fireEvent.press(screen.getByRole('button', { name: 'Release to grower' }));
    fireEvent.changeText(screen.getByTestId('field-release-zones'), '13');
    fireEvent.changeText(screen.getByTestId('field-release-dueDate'), '31/01/2027');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Release to grower' })));
    expect(screen.getByTestId('error-release-batch')).toHaveTextContent('Batch is required');
    expect(screen.getByTestId('error-release-zones')).toHaveTextContent('Zones K must be 1–12');
    expect(screen.getByTestId('error-release-dueDate')).toHaveTextContent(/^Due date must be a date like 2027-01-31$/);
    expect(requests).toHaveLength(0);
  });

  it('releases with the defaults and opens the new order', async () => {
    const { requests, result } = show('physicist');
    fireEvent.press(screen.getByRole('button', { name: 'Release to grower' }));
    fireEvent.changeText(screen.getByTestId('field-release-batch'), 'NL-P7-25-002');
    fireEvent.changeText(screen.getByTestId('field-release-dueDate'), '2027-02-01');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Release to grower' })));
    expect(requests[0]).toMatchObject({ method: 'POST', body: { batch: 'NL-P7-25-002', dueDate: '2027-02-01', notes: '', zones: 3, lossBudget: 1, measureTemperature: 300 } });
    await waitFor(() => expect(result.getPathname()).toBe(`/growth/${ids.order}`));
  });

  it('shows why the server refused (a run that has not converged)', async () => {
    show('admin', { status: 409, body: { name: 'Conflict', message: 'Only a converged run with a doping profile can be released.', errors: [{ field: 'runId', message: 'the run is running' }] } });
    fireEvent.press(screen.getByRole('button', { name: 'Release to grower' }));
    fireEvent.changeText(screen.getByTestId('field-release-batch'), 'NL-P7-25-003');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Release to grower' })));
    expect(await screen.findByText('Only a converged run with a doping profile can be released.')).toBeOnTheScreen();
    expect(screen.getByText('Run: the run is running')).toBeOnTheScreen();
  });
});
