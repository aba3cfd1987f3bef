import { describe, expect, it } from 'vitest';
import { isDatabaseUnreachable } from '@/db/connection-errors';

const withCode = (code: string, message = 'failed') => Object.assign(new Error(message), { code });

describe('isDatabaseUnreachable', () => {
  // SQLSTATE codes from the PostgreSQL 15 manual, Appendix A "PostgreSQL Error Codes"; the socket codes are Node's
  // (Node.js documentation, "Common system errors"); the messages are the ones pg 8 and knex 3 throw.
  const unreachable: [string, unknown][] = [
    ['connection refused (ECONNREFUSED)', withCode('ECONNREFUSED', 'connect ECONNREFUSED 127.0.0.1:5432')],
    ['connection reset (ECONNRESET)', withCode('ECONNRESET')],
    ['connection failure (SQLSTATE 08006)', withCode('08006')],
    ['server shutting down (57P01 admin_shutdown)', withCode('57P01', 'terminating connection due to administrator command')],
    ['server starting up (57P03 cannot_connect_now)', withCode('57P03', 'the database system is starting up')],
    ['too many connections (53300)', withCode('53300')],
    ['a query on a dropped connection', new Error('update "sites" set … - Connection terminated unexpectedly')],
    ['knex finding no free connection', Object.assign(new Error('Knex: Timeout acquiring a connection. The pool is probably full.'), { name: 'KnexTimeoutError' })],
    ['a client left broken by an earlier error', new Error('ROLLBACK - Client has encountered a connection error and is not queryable')],
    ['one refusal per address', new AggregateError([withCode('ECONNREFUSED'), withCode('ECONNREFUSED')], 'connect failed')],
    ['a wrapped cause', new Error('sign-in failed', { cause: withCode('ETIMEDOUT') })],
  ];
  for (const [name, error] of unreachable) {
    it(`is true for ${name}`, () => expect(isDatabaseUnreachable(error)).toBe(true));
  }

  const other: [string, unknown][] = [
    ['a unique violation (23505)', withCode('23505', 'duplicate key value violates unique constraint')],
    ['a deadlock (40P01), a bug to fix rather than an outage', withCode('40P01', 'deadlock detected')],
    ['a cancelled statement (57014)', withCode('57014', 'canceling statement due to statement timeout')],
    ['a missing column', new Error('column "notes" does not exist')],
    ['a string', 'ECONNREFUSED'],
    ['null', null],
  ];
  for (const [name, error] of other) {
    it(`is false for ${name}`, () => expect(isDatabaseUnreachable(error)).toBe(false));
  }

  it('stops on a cause that points back at itself', () => {
    const loop = new Error('outer') as Error & { cause?: unknown };
    loop.cause = loop;
    expect(isDatabaseUnreachable(loop)).toBe(false);
  });
});
