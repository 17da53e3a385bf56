import { QueryFailedError, QueryRunnerAlreadyReleasedError } from 'typeorm';
import { isDatabaseUnavailable } from './db-errors';

/** Codes from PostgreSQL's SQLSTATE table (PostgreSQL 15 documentation, appendix A) and Node's socket errors. */
const pgError = (code: string, message = 'x') => Object.assign(new Error(message), { code });

describe('isDatabaseUnavailable', () => {
  it('recognises a server going away, however it is wrapped', () => {
    expect(isDatabaseUnavailable(pgError('57P01', 'terminating connection due to administrator command'))).toBe(true);
    expect(isDatabaseUnavailable(pgError('57P03', 'the database system is starting up'))).toBe(true);
    expect(isDatabaseUnavailable(pgError('08006'))).toBe(true);
    expect(isDatabaseUnavailable(pgError('ECONNREFUSED', 'connect ECONNREFUSED 127.0.0.1:5432'))).toBe(true);
    expect(isDatabaseUnavailable(new Error('Connection terminated unexpectedly'))).toBe(true);
    expect(isDatabaseUnavailable(new QueryFailedError('SELECT 1', [], pgError('57P01')))).toBe(true);
    expect(isDatabaseUnavailable(new QueryRunnerAlreadyReleasedError())).toBe(true);
    expect(isDatabaseUnavailable(Object.assign(new Error('outer'), { cause: pgError('ECONNRESET') }))).toBe(true);
  });

  it('leaves real query errors alone: they are bugs or bad input, not outages', () => {
    expect(isDatabaseUnavailable(new QueryFailedError('SELEC 1', [], pgError('42601', 'syntax error at or near "SELEC"')))).toBe(false);
    expect(isDatabaseUnavailable(pgError('23505', 'duplicate key value violates unique constraint'))).toBe(false);
    expect(isDatabaseUnavailable(new Error('something else'))).toBe(false);
    expect(isDatabaseUnavailable(null)).toBe(false);
  });
});
