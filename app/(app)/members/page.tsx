import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { rolesFor } from '@/lib/auth/policy';
import { AuditList } from '@/components/members/audit-list';
import { InviteMemberForm } from '@/components/members/invite-member-form';
import { MemberRow } from '@/components/members/member-row';
import { OrganisationSettingsForm } from '@/components/members/organisation-settings-form';
import { listAudit } from '@/db/audit';
import { listMembers } from '@/db/memberships';
import { requireRole } from '@/lib/auth';

export const metadata: Metadata = { title: 'Members' };

export default async function MembersPage() {
  const admin = await requireRole(rolesFor('members.manage'));
  if (admin.mustChangePassword) redirect('/profile?welcome=1');
  const [members, audit] = await Promise.all([listMembers(admin.organisationId), listAudit(admin.organisationId, 20)]);
  const names = Object.fromEntries(members.map((m) => [m.userId, m.displayName]));

  return (
    <div className="flex flex-col gap-8">
      <header>
        <h1 className="text-2xl font-bold tracking-tight">Members of {admin.organisationName}</h1>
        <p className="text-sm text-ink-muted">
          Admins manage members and settings; engineers change sites, items and assessments; reviewers approve and send
          hazard sheets; viewers read. An organisation always keeps at least one admin.
        </p>
      </header>

      <section className="rounded-card bg-paper-raised p-5 shadow-card">
        <h2 className="mb-3 text-lg font-bold">Invite a member</h2>
        <InviteMemberForm />
      </section>

      <section className="overflow-x-auto rounded-card bg-paper-raised p-5 shadow-card">
        <h2 className="mb-3 text-lg font-bold">
          {members.length} member{members.length === 1 ? '' : 's'}
        </h2>
        <table className="w-full text-left">
          <thead className="text-xs uppercase tracking-wide text-ink-muted">
            <tr>
              <th className="pb-2 font-semibold">Person</th>
              <th className="pb-2 font-semibold">Role</th>
              <th className="pb-2 text-right font-semibold">
                <span className="sr-only">Remove</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {members.map((m) => (
              <MemberRow
                key={`${m.userId}-${m.role}`}
                userId={m.userId}
                displayName={m.displayName}
                email={m.email}
                role={m.role}
                pendingPassword={m.mustChangePassword}
                isSelf={m.userId === admin.userId}
              />
            ))}
          </tbody>
        </table>
      </section>

      <div className="grid gap-6 md:grid-cols-[1fr_2fr]">
        <section className="rounded-card bg-paper-raised p-5 shadow-card">
          <h2 className="mb-3 text-lg font-bold">Organisation settings</h2>
          <OrganisationSettingsForm name={admin.organisationName} />
        </section>
        <section className="rounded-card bg-paper-raised p-5 shadow-card">
          <h2 className="mb-3 text-lg font-bold">Recent changes</h2>
          <AuditList rows={audit} names={names} />
        </section>
      </div>
    </div>
  );
}
