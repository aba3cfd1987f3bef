import type { Metadata } from 'next';
import { can } from '@/lib/auth/policy';
import { LadderEditor } from '@/components/ladder/ladder-editor';
import { LadderView } from '@/components/ladder/ladder-view';
import { SafetyNote } from '@/components/layout/safety-note';
import { listLadder } from '@/db/consequence-levels';
import { requireRole } from '@/lib/auth';

export const metadata: Metadata = { title: 'Consequence ladder' };

export default async function ConsequenceLadderPage() {
  const member = await requireRole('any');
  const ladder = await listLadder(member.organisationId);
  const units = member.unitSystem;
  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-col gap-1">
        <h1 className="text-2xl font-bold tracking-tight">Consequence ladder</h1>
        <p className="max-w-3xl text-sm text-ink-muted">
          Every item in the register sits on one level of this ladder, chosen by the effective impact energy stored
          with the item: the energy it would strike with, counting, in water, the added mass of the water it drags along
          as it sinks. Changing the ladder reclassifies every item at once, and the change is recorded in the audit log.
        </p>
      </header>

      <section className="rounded-card bg-paper-raised p-5 shadow-card" aria-labelledby="ladder-levels">
        <h2 id="ladder-levels" className="mb-3 text-lg font-bold">
          Levels
        </h2>
        <LadderView ladder={ladder} units={units} />
      </section>

      <SafetyNote />

      {can(member, 'ladder.edit') ? (
        <section className="rounded-card bg-paper-raised p-5 shadow-card" aria-labelledby="ladder-edit">
          <h2 id="ladder-edit" className="mb-1 text-lg font-bold">
            Change the ladder
          </h2>
          <p className="mb-4 max-w-3xl text-sm text-ink-muted">
            Between 2 and 8 levels, lowest starting at 0 J, each bound above the one below. Base bounds on a
            published test or criterion and name it as the source.
          </p>
          <LadderEditor ladder={ladder} units={units} />
        </section>
      ) : (
        <p className="text-sm text-ink-muted">Only an admin of your organisation can change the ladder.</p>
      )}
    </div>
  );
}
