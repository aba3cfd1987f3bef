import Link from 'next/link';
import { can } from '@/lib/auth/policy';
import { Wordmark } from '@/components/brand/plumbline-mark';
import type { Member } from '@/db/types';
import { ROLE_LABELS } from '@/lib/domain';
import { signOutAction } from '@/lib/actions/auth';
import { NavLink } from './nav-link';

export function AppHeader({ member }: { member: Member }) {
  return (
    <header className="border-b border-paper-rule bg-paper-raised print:hidden">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-5 py-3">
        <Link href="/" aria-label="Plumbline home">
          <Wordmark />
        </Link>
        <nav aria-label="Main" className="flex flex-wrap gap-1">
          <NavLink href="/">Overview</NavLink>
          <NavLink href="/calculator">Drop calculator</NavLink>
          <NavLink href="/sites">Sites</NavLink>
          <NavLink href="/consequence-levels">Consequence ladder</NavLink>
          {can(member, 'members.manage') ? <NavLink href="/members">Members</NavLink> : null}
          <NavLink href="/profile">Profile</NavLink>
        </nav>
        <div className="ml-auto flex items-center gap-3 text-sm">
          <span className="text-right leading-tight">
            <span className="block font-semibold text-ink">{member.displayName}</span>
            <span className="block text-xs text-ink-muted">
              {member.organisationName} · {ROLE_LABELS[member.role]}
            </span>
          </span>
          <form action={signOutAction}>
            <button
              type="submit"
              className="rounded-md border border-paper-rule px-3 py-1.5 text-sm font-semibold text-ink-soft hover:bg-paper-sunk"
            >
              Sign out
            </button>
          </form>
        </div>
      </div>
    </header>
  );
}
