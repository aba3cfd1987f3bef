import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { getDb } from '@/db/knex';

const knexCli = (...args: string[]) =>
  execFileSync(process.execPath, ['--import', 'tsx', 'node_modules/knex/bin/cli.js', ...args, '--knexfile', 'knexfile.ts'], {
    env: process.env,
    encoding: 'utf8',
  });

async function tables(): Promise<string[]> {
  const rows = await getDb()('pg_tables').where({ schemaname: 'public' }).select('tablename');
  return rows.map((r: { tablename: string }) => r.tablename).filter((t: string) => !t.startsWith('knex_'));
}

const FOUNDATION_TABLES = ['audit_log', 'memberships', 'organisations', 'sign_in_attempts', 'users'];

describe('migrations', () => {
  it('roll back to an empty schema and forward again', async () => {
    knexCli('migrate:rollback', '--all');
    expect(await tables()).toEqual([]);
    knexCli('migrate:latest');
    expect((await tables()).sort()).toEqual(expect.arrayContaining(FOUNDATION_TABLES));
  });

  it('keeps the audit log append-only', async () => {
    const db = getDb();
    const [row] = await db('audit_log').insert({ action: 'test.append', entity_type: 'test' }).returning('id');
    await expect(db('audit_log').where({ id: row.id }).update({ action: 'changed' })).rejects.toThrow(/append-only/);
    await expect(db('audit_log').where({ id: row.id }).delete()).rejects.toThrow(/append-only/);
  });
});
