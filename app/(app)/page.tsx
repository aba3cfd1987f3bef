import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { OverviewPanels } from '@/components/layout/overview-panels';
import { SafetyNote } from '@/components/layout/safety-note';
import { requireRole } from '@/lib/auth';

export const metadata: Metadata = { title: 'Overview' };

export default async function HomePage() {
  const member = await requireRole('any');
  if (member.mustChangePassword) redirect('/profile?welcome=1');
  return (
    <div className="flex flex-col gap-8">
      <section className="flex flex-col gap-3">
        <p className="text-sm font-semibold uppercase tracking-wide text-brass-600">{member.organisationName}</p>
        <h1 className="text-3xl font-bold tracking-tight">Welcome, {member.displayName}</h1>
        <p className="max-w-3xl text-ink-soft">
          Plumbline is for deciding what happens when something falls from height. For each tool, fitting or load it
          works out the fall time (the warning a person below gets), the impact speed and kinetic energy, how far wind
          or a release speed carries it — the radius to barricade — and, offshore, how it carries on through seawater
          to the seabed. It solves the equations of motion with air or water drag instead of the vacuum rule
          E = m·g·h, which overstates light, broad items and says nothing about drift.
        </p>
      </section>
      <OverviewPanels role={member.role} />
      <SafetyNote />
    </div>
  );
}
