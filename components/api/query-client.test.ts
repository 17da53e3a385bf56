import { ApiError } from './client';
import { meQueryKey } from './auth';
import { createQueryClient } from './query-client';

const me = {
  user: { id: 'u1', email: 'ada@northlight.example', displayName: 'Ada', role: 'admin' },
  team: { id: '00000000-0000-4000-8000-000000000001', name: 'Northlight' },
};

function failWith(status: number) {
  return async () => {
    throw new ApiError({ status, name: status === 401 ? 'Unauthorized' : 'Forbidden', message: 'no' });
  };
}

describe('createQueryClient', () => {
  it('ends the session in the cache when any request answers 401', async () => {
    const client = createQueryClient();
    client.setQueryData(meQueryKey, me);
    await client.prefetchQuery({ queryKey: ['families'], queryFn: failWith(401), retry: false });
    expect(client.getQueryData(meQueryKey)).toBeNull();
    client.clear();
  });

  it('keeps the session on other refusals (403)', async () => {
    const client = createQueryClient();
    client.setQueryData(meQueryKey, me);
    await client.prefetchQuery({ queryKey: ['outbox'], queryFn: failWith(403), retry: false });
    expect(client.getQueryData(meQueryKey)).toEqual(me);
    client.clear();
  });
});
