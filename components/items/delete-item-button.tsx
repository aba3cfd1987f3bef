'use client';

import { useActionState } from 'react';
import { deleteItemAction } from '@/lib/actions/register';
import { idle } from '@/lib/actions/state';

export function DeleteItemButton({ id, siteId, tag }: { id: string; siteId: string; tag: string }) {
  const [state, action, pending] = useActionState(deleteItemAction, idle);
  return (
    <form
      action={action}
      onSubmit={(e) => {
        if (!window.confirm(`Delete ${tag} from the register?`)) e.preventDefault();
      }}
      className="flex flex-col items-start gap-1"
    >
      <input type="hidden" name="id" value={id} />
      <input type="hidden" name="site_id" value={siteId} />
      <button
        type="submit"
        disabled={pending}
        className="rounded-md border border-flare-500 bg-paper-raised px-4 py-2 text-sm font-semibold text-flare-700 hover:bg-flare-50 disabled:opacity-60"
      >
        Delete this item
      </button>
      {state.message ? (
        <p role="alert" className="text-sm text-flare-700">
          {state.message}
        </p>
      ) : null}
    </form>
  );
}
