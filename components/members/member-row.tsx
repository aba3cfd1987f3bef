'use client';

import { useActionState } from 'react';
import type { Role } from '@/lib/domain';
import { changeRoleAction, removeMemberAction } from '@/lib/actions/members';
import { idle } from '@/lib/actions/state';
import { ROLE_OPTIONS } from './role-options';

interface Props {
  userId: string;
  displayName: string;
  email: string;
  role: Role;
  pendingPassword: boolean;
  isSelf: boolean;
}

export function MemberRow({ userId, displayName, email, role, pendingPassword, isSelf }: Props) {
  const [roleState, roleAction, rolePending] = useActionState(changeRoleAction, idle);
  const [removeState, removeAction, removePending] = useActionState(removeMemberAction, idle);
  const message = roleState.message ?? removeState.message;
  const failed = (roleState.message && !roleState.ok) || (removeState.message && !removeState.ok);
  const selectId = `role-${userId}`;

  return (
    <tr className="border-t border-paper-rule align-top">
      <td className="py-3 pr-3">
        <span className="block font-semibold">
          {displayName}
          {isSelf ? <span className="ml-2 text-xs font-normal text-ink-muted">(you)</span> : null}
        </span>
        <span className="block text-sm text-ink-muted">{email}</span>
        {pendingPassword ? <span className="text-xs text-brass-700">Has not yet chosen a password</span> : null}
      </td>
      <td className="py-3 pr-3">
        <form action={roleAction} className="flex flex-wrap items-center gap-2">
          <input type="hidden" name="userId" value={userId} />
          <label htmlFor={selectId} className="sr-only">
            Role of {displayName}
          </label>
          <select
            id={selectId}
            name="role"
            defaultValue={role}
            className="rounded-md border border-paper-rule bg-paper-raised px-2 py-1.5 text-sm"
          >
            {ROLE_OPTIONS.map((o) => (
              <option key={o.value} value={o.value}>
                {o.label}
              </option>
            ))}
          </select>
          <button
            type="submit"
            disabled={rolePending}
            className="rounded-md border border-paper-rule px-3 py-1.5 text-sm font-semibold hover:bg-paper-sunk disabled:opacity-60"
          >
            Save role
          </button>
        </form>
        {message ? (
          <p role={failed ? 'alert' : 'status'} className={`mt-1 text-sm ${failed ? 'text-flare-700' : 'text-moss-700'}`}>
            {message}
          </p>
        ) : null}
      </td>
      <td className="py-3 text-right">
        {isSelf ? null : (
          <form
            action={removeAction}
            onSubmit={(e) => {
              if (!window.confirm(`Remove ${displayName} from the organisation?`)) e.preventDefault();
            }}
          >
            <input type="hidden" name="userId" value={userId} />
            <button
              type="submit"
              disabled={removePending}
              className="rounded-md border border-flare-500 px-3 py-1.5 text-sm font-semibold text-flare-700 hover:bg-flare-50 disabled:opacity-60"
              aria-label={`Remove ${displayName}`}
            >
              Remove
            </button>
          </form>
        )}
      </td>
    </tr>
  );
}
