'use client';

import { useEffect } from 'react';
import { inviteMemberAction } from '@/lib/actions/members';
import { inviteMemberSchema } from '@/lib/validation/member';
import { FormMessage, SelectField, SubmitButton, TextField } from '@/components/forms/fields';
import { useActionForm } from '@/components/forms/use-action-form';
import { ROLE_OPTIONS } from './role-options';

export function InviteMemberForm() {
  const { form, state, pending, formAction, onSubmit, errorFor, ready } = useActionForm(
    inviteMemberSchema,
    inviteMemberAction,
    { displayName: '', email: '', role: 'viewer' },
  );
  const { reset } = form;
  useEffect(() => {
    if (state.ok) reset();
  }, [state, reset]);

  return (
    <form action={formAction} onSubmit={onSubmit} noValidate data-ready={ready || undefined} className="flex flex-col gap-4" aria-label="Invite a member">
      <div className="grid gap-4 sm:grid-cols-3">
        <TextField label="Name" autoComplete="off" error={errorFor('displayName')} {...form.register('displayName')} />
        <TextField label="E-mail" type="email" autoComplete="off" error={errorFor('email')} {...form.register('email')} />
        <SelectField label="Role" options={ROLE_OPTIONS} error={errorFor('role')} {...form.register('role')} />
      </div>
      <FormMessage ok={state.ok} message={state.message} />
      {state.secret ? (
        <p className="rounded-md border border-brass-300 bg-brass-50 px-3 py-2 text-sm">
          One-time password, shown only now:{' '}
          <code data-testid="temporary-password" className="num select-all rounded bg-paper-raised px-2 py-0.5 text-base">
            {state.secret}
          </code>
        </p>
      ) : null}
      <div>
        <SubmitButton pending={pending}>Invite member</SubmitButton>
      </div>
    </form>
  );
}
