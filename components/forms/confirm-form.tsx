'use client';

import { useActionState, type ReactNode } from 'react';
import type { ActionState } from '@/lib/actions/state';
import { idle } from '@/lib/actions/state';

type Action = (prev: ActionState, form: FormData) => Promise<ActionState>;

/** A one-button form for a destructive action: asks first, posts its hidden fields, shows a refusal under the button. */
export function ConfirmForm({
  action,
  fields,
  question,
  children,
  small = false,
  disabledWhy,
}: {
  action: Action;
  fields: Record<string, string>;
  question: string;
  children: ReactNode;
  small?: boolean;
  /** Set when the action cannot apply now; shown as the button's tooltip. */
  disabledWhy?: string;
}) {
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
        disabled={pending || Boolean(disabledWhy)}
        title={disabledWhy}
        className={`rounded-md border border-flare-500 bg-paper-raised text-sm font-semibold text-flare-700 hover:bg-flare-50 disabled:cursor-not-allowed disabled:opacity-40 ${small ? 'px-3 py-1' : 'px-4 py-2'}`}
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
