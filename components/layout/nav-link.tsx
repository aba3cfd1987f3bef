'use client';

import Link, { useLinkStatus } from 'next/link';
import { usePathname } from 'next/navigation';
import type { ReactNode } from 'react';

export function NavLink({ href, children }: { href: string; children: ReactNode }) {
  const pathname = usePathname();
  const active = href === '/' ? pathname === '/' : pathname.startsWith(href);
  return (
    <Link
      href={href}
      aria-current={active ? 'page' : undefined}
      className={`rounded-md px-3 py-1.5 text-sm font-semibold ${
        active ? 'bg-cord-50 text-cord-700' : 'text-ink-soft hover:bg-paper-sunk'
      }`}
    >
      {children}
      <Pending />
    </Link>
  );
}

// Pages that answer 403 or 404 render before streaming (so the status is real), with no loading screen: the link
// itself shows that the next page is on its way.
function Pending() {
  const { pending } = useLinkStatus();
  return <span aria-hidden className={`ml-1.5 inline-block h-1.5 w-1.5 rounded-full bg-cord-500 align-middle ${pending ? 'animate-pulse' : 'invisible'}`} />;
}
