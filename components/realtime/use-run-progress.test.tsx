import { Text } from 'react-native';
import { act, render, screen } from '@testing-library/react-native';
import { QueryClientProvider } from '@tanstack/react-query';
import { createTestQueryClient } from '@/components/test-utils';
import { ids, progress } from '@/components/screens/runs/test-fixtures';
import { lastSocket, sockets } from './test-socket';
import { useRunProgress } from './use-run-progress';

jest.mock('socket.io-client', () => jest.requireActual('@/components/realtime/test-socket'));

function Probe({ runId, active }: { runId: string; active: boolean }) {
  const { latest, live, connection } = useRunProgress(runId, active);
  return <Text testID="probe">{`${connection} ${latest ? latest.fractionDone : '-'} ${live.length}`}</Text>;
}

function mount(active = true) {
  const client = createTestQueryClient();
  const invalidate = jest.spyOn(client, 'invalidateQueries');
  const view = render(
    <QueryClientProvider client={client}>
      <Probe runId={ids.run} active={active} />
    </QueryClientProvider>,
  );
  return { ...view, invalidate };
}

afterEach(() => {
  sockets.length = 0;
});

describe('useRunProgress', () => {
  it('watches the run on every connect, keeps its reports, ignores malformed ones', () => {
    mount();
    const socket = lastSocket();
    expect(screen.getByTestId('probe')).toHaveTextContent('connecting - 0');
    act(() => socket.serverConnect());
    act(() => socket.serverEmit('run:progress', progress({ fractionDone: 0.3 })));
    act(() => socket.serverEmit('run:progress', { runId: ids.run, fractionDone: 'half' }));
    act(() => socket.serverEmit('run:progress', progress({ fractionDone: 0.5 })));
    expect(screen.getByTestId('probe')).toHaveTextContent('live 0.5 2');
    act(() => socket.serverEmit('disconnect'));
    expect(screen.getByTestId('probe')).toHaveTextContent('offline 0.5 2');
    act(() => socket.serverConnect());
    expect(socket.watched()).toEqual([`run:${ids.run}`, `run:${ids.run}`]);
  });

  it('refreshes the run and the lists when the run changes state', () => {
    const { invalidate } = mount();
    act(() => lastSocket().serverConnect());
    act(() => lastSocket().serverEmit('run:state', { runId: ids.run, state: 'succeeded', error: null }));
    const keys = invalidate.mock.calls.map(([filters]) => JSON.stringify(filters?.queryKey));
    expect(keys).toEqual(expect.arrayContaining([JSON.stringify(['runs', 'list']), JSON.stringify(['runs', 'detail', ids.run])]));
  });

  it('closes the socket and drops its listeners on unmount', () => {
    const { unmount } = mount();
    const socket = lastSocket();
    expect(socket.listenerCount()).toBeGreaterThan(0);
    unmount();
    expect(socket.disconnected).toBe(true);
    expect(socket.listenerCount()).toBe(0);
  });

  it('opens no socket for a finished run', () => {
    mount(false);
    expect(sockets).toHaveLength(0);
    expect(screen.getByTestId('probe')).toHaveTextContent('off - 0');
  });
});
