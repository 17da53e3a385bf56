import { logError } from './error-log';

describe('logError', () => {
  const written: string[] = [];
  let spy: jest.SpyInstance;
  const env = process.env.NODE_ENV;
  beforeEach(() => {
    written.length = 0;
    spy = jest.spyOn(process.stderr, 'write').mockImplementation((chunk: string | Uint8Array) => { written.push(String(chunk)); return true; });
  });
  afterEach(() => {
    spy.mockRestore();
    process.env.NODE_ENV = env;
  });

  it('writes one JSON object per line in production, with the request and the stack', () => {
    process.env.NODE_ENV = 'production';
    logError('api', 'unexpected error answered 500', new TypeError('boom'), { method: 'GET', path: '/api/runs' });
    expect(written).toHaveLength(1);
    expect(written[0]!.endsWith('\n')).toBe(true);
    const line = JSON.parse(written[0]!) as Record<string, string>;
    expect(line).toMatchObject({ level: 'error', source: 'api', message: 'unexpected error answered 500', method: 'GET', path: '/api/runs', error: 'TypeError', detail: 'boom' });
    expect(line.stack).toContain('TypeError: boom');
    expect(Number.isNaN(Date.parse(line.time!))).toBe(false);
  });

  it('writes readable text elsewhere', () => {
    process.env.NODE_ENV = 'development';
    logError('worker', 'uncaught exception', new Error('lost'));
    expect(written[0]).toMatch(/^\[worker\] uncaught exception: Error: lost/);
  });
});
