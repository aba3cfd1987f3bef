// Demo organisation for the start command: an invented company, invented people, demo-only passwords.
import { hashPassword } from '../../lib/auth/password';
import { insertDefaultLadder } from '../consequence-levels';
import { closeDb, getDb } from '../knex';
import { findOrganisationByName } from '../organisations';
import type { Role } from '@/lib/domain';
import { seedDemoRegister } from './demo-register';

export const DEMO_ORGANISATION = 'Halyard Ness Access & Lifting (demo)';

export const DEMO_USERS: { email: string; password: string; role: Role; displayName: string }[] = [
  { email: 'admin@halyard-ness.example', password: 'demo-admin-2026', role: 'admin', displayName: 'Morag Finlay' },
  { email: 'engineer@halyard-ness.example', password: 'demo-engineer-2026', role: 'engineer', displayName: 'Tomasz Wrona' },
  { email: 'reviewer@halyard-ness.example', password: 'demo-reviewer-2026', role: 'reviewer', displayName: 'Aisha Okafor' },
  { email: 'viewer@halyard-ness.example', password: 'demo-viewer-2026', role: 'viewer', displayName: 'Jonas Berg' },
];

export async function seedDemo(): Promise<boolean> {
  const db = getDb();
  if (await findOrganisationByName(DEMO_ORGANISATION)) return false;
  const hashes = await Promise.all(DEMO_USERS.map((u) => hashPassword(u.password)));
  await db.transaction(async (trx) => {
    const [org] = await trx('organisations').insert({ name: DEMO_ORGANISATION }).returning('id');
    await insertDefaultLadder(trx, org.id);
    const userIds: Partial<Record<Role, string>> = {};
    for (const [i, u] of DEMO_USERS.entries()) {
      const [user] = await trx('users')
        .insert({ email: u.email, password_hash: hashes[i], display_name: u.displayName })
        .returning('id');
      await trx('memberships').insert({ organisation_id: org.id, user_id: user.id, role: u.role });
      userIds[u.role] = user.id;
    }
    await trx('audit_log').insert({
      organisation_id: org.id,
      action: 'organisation.created',
      entity_type: 'organisation',
      entity_id: org.id,
      after: JSON.stringify({ name: DEMO_ORGANISATION, seeded: true }),
    });
    await seedDemoRegister(org.id, userIds.engineer!, trx);
  });
  return true;
}

async function main() {
  const created = await seedDemo();
  console.error(created ? '[plumbline] demo organisation seeded' : '[plumbline] demo organisation already present: kept as it is');
  console.error('[plumbline] demo sign-ins:');
  for (const u of DEMO_USERS) console.error(`    ${u.role.padEnd(9)} ${u.email.padEnd(32)} ${u.password}`);
  await closeDb();
}

if (process.argv[1]?.endsWith('demo.ts')) {
  main().catch(async (error) => {
    console.error(error);
    await closeDb();
    process.exit(1);
  });
}
