'use client';

import { useActionState, type ReactNode } from 'react';
import type { ActionState } from '@/lib/actions/state';
import { idle } from '@/lib/actions/state';

type Action = (prev: ActionState, form: FormData) => Promise<ActionState>;

/** A one-button form for a destructive action: asks first, posts its hidden fields, shows a refusal under the button. */
export function ConfirmForm({ action, fields, question, children }: { action: Action; fields: Record<string, string>; question: string; children: ReactNode }) {
  const [state, formAction, pending] = useActionState(action, idle);
  return (
    <form
      action={formAction}
      onSubmit={(e) => {
        if (!window.confirm(question)) e.preventDefault();
      }}
      className="flex flex-col items-start gap-1"
    >
      {Object.entries(fields).map(([name, value]) => (
        <input key={name} type="hidden" name={name} value={value} />
      ))}
      <button
        type="submit"
        disabled={pending}
        className="rounded-md border border-flare-500 bg-paper-raised px-4 py-2 text-sm font-semibold text-flare-700 hover:bg-flare-50 disabled:opacity-60"
      >
        {children}
      </button>
      {state.message && !state.ok ? (
        <p role="alert" className="text-sm text-flare-700">
          {state.message}
        </p>
      ) : null}
    </form>
  );
}
