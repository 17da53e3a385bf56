import { createTestQueryClient } from '@/components/test-utils';
import { openSocket } from './socket';
import { lastSocket, sockets } from './test-socket';

jest.mock('socket.io-client', () => jest.requireActual('@/components/realtime/test-socket'));

afterEach(() => {
  sockets.length = 0;
});

function open() {
  const client = createTestQueryClient();
  const invalidate = jest.spyOn(client, 'invalidateQueries');
  openSocket(client);
  const socket = lastSocket();
  socket.serverConnect();
  return { socket, invalidate };
}

describe('openSocket', () => {
  it('after the server closes it (role changed or member removed), asks who is signed in and reconnects once', () => {
    const { socket, invalidate } = open();
    socket.serverDisconnect('io server disconnect');
    expect(socket.connectCalls).toBe(1);
    expect(invalidate).toHaveBeenCalledWith({ queryKey: ['auth', 'me'] });
    // A removed member's handshake is refused: nothing tries again.
    socket.serverEmit('connect_error', new Error('sign in first'));
    expect(socket.connectCalls).toBe(1);
  });

  it('leaves a lost connection to socket.io’s own reconnection and keeps the session', () => {
    const { socket, invalidate } = open();
    socket.serverDisconnect('transport close');
    expect(socket.connectCalls).toBe(0);
    expect(invalidate).not.toHaveBeenCalled();
  });
});
