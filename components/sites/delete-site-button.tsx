'use client';

import { useActionState } from 'react';
import { deleteSiteAction } from '@/lib/actions/register';
import { idle } from '@/lib/actions/state';

export function DeleteSiteButton({ id, name, lines }: { id: string; name: string; lines: number }) {
  const [state, action, pending] = useActionState(deleteSiteAction, idle);
  return (
    <form
      action={action}
      onSubmit={(e) => {
        const what = lines ? ` and its ${lines} register line${lines === 1 ? '' : 's'}` : '';
        if (!window.confirm(`Delete the site ${name}${what}? This cannot be undone.`)) e.preventDefault();
      }}
      className="flex flex-col items-start gap-1"
    >
      <input type="hidden" name="id" value={id} />
      <button
        type="submit"
        disabled={pending}
        className="rounded-md border border-flare-500 bg-paper-raised px-4 py-2 text-sm font-semibold text-flare-700 hover:bg-flare-50 disabled:opacity-60"
      >
        Delete this site
      </button>
      {state.message ? (
        <p role="alert" className="text-sm text-flare-700">
          {state.message}
        </p>
      ) : null}
    </form>
  );
}
