import { readEnv } from './env';

describe('readEnv', () => {
  it('gives the development and test stacks separate databases and ports', () => {
    const dev = readEnv({});
    const test = readEnv({ FROSTGRADE_PROFILE: 'test' });
    expect(dev.databaseUrl).not.toBe(test.databaseUrl);
    expect(dev.port).not.toBe(test.port);
    expect(dev.smtp.port).not.toBe(test.smtp.port);
    expect(dev.appOrigin).toBe(`http://127.0.0.1:${dev.port}`);
  });

  it('never runs the mail catcher in production', () => {
    expect(readEnv({ NODE_ENV: 'production', MAIL_CATCHER: '1' }).mailCatcher).toBe(false);
    expect(readEnv({}).mailCatcher).toBe(true);
  });

  it('names the variable that is wrong', () => {
    expect(() => readEnv({ PORT: 'eighty' })).toThrow(/PORT/);
    expect(() => readEnv({ FROSTGRADE_PROFILE: 'staging' })).toThrow(/FROSTGRADE_PROFILE/);
  });
});
