import Link from 'next/link';
import { can } from '@/lib/auth/policy';
import type { Role } from '@/lib/domain';

interface Panel {
  title: string;
  body: string;
  href: string;
  cta: string;
}

const COMMON: Panel[] = [
  {
    title: 'Sites and registers',
    body: 'Each site’s register of items at height, level by level, with every item’s fall, impact energy and consequence level stored and kept current.',
    href: '/sites',
    cta: 'Open the sites',
  },
  {
    title: 'Drop calculator',
    body: 'Fall time, impact speed and energy, drift in wind and the fall on through seawater for one object, checked against the closed forms.',
    href: '/calculator',
    cta: 'Open the calculator',
  },
  {
    title: 'Consequence ladder',
    body: 'The energy levels your organisation classifies impacts by, each bound set at a published reference energy, with the controls each level calls for.',
    href: '/consequence-levels',
    cta: 'See the ladder',
  },
  {
    title: 'Your profile',
    body: 'Your name, your password, and whether Plumbline shows SI or US customary units.',
    href: '/profile',
    cta: 'Open profile',
  },
];

const ADMIN: Panel[] = [
  {
    title: 'Members and roles',
    body: 'Invite engineers, reviewers and viewers, change their roles, and rename the organisation.',
    href: '/members',
    cta: 'Manage members',
  },
];

const ROLE_DUTY: Record<Role, string> = {
  admin: 'You manage members and organisation settings, and can do everything an engineer or reviewer can.',
  engineer: 'You create and change sites, items, calculations and assessments.',
  reviewer: 'You read everything, and approve or return assessments and send hazard sheets.',
  viewer: 'You can read everything in your organisation; changes are for other roles.',
};

export function OverviewPanels({ role }: { role: Role }) {
  const panels = can({ role }, 'members.manage') ? [...ADMIN, ...COMMON] : COMMON;
  return (
    <section aria-label="Where to go" className="flex flex-col gap-4">
      <p className="text-sm text-ink-muted">{ROLE_DUTY[role]}</p>
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        {panels.map((p) => (
          <article key={p.href} className="flex flex-col gap-2 rounded-card bg-paper-raised p-5 shadow-card">
            <h2 className="text-lg font-bold">{p.title}</h2>
            <p className="flex-1 text-sm text-ink-soft">{p.body}</p>
            <Link href={p.href} className="self-start text-sm font-semibold text-cord-600 underline">
              {p.cta}
            </Link>
          </article>
        ))}
      </div>
    </section>
  );
}
