'use client';

import { useEffect } from 'react';
import { changePasswordAction } from '@/lib/actions/profile';
import { passwordChangeSchema } from '@/lib/validation/user';
import { FormMessage, SubmitButton, TextField } from '@/components/forms/fields';
import { useActionForm } from '@/components/forms/use-action-form';

export function PasswordForm() {
  const { form, state, pending, formAction, onSubmit, errorFor, ready } = useActionForm(
    passwordChangeSchema,
    changePasswordAction,
    { currentPassword: '', newPassword: '', confirmPassword: '' },
  );
  const { reset } = form;
  useEffect(() => {
    if (state.ok) reset();
  }, [state, reset]);
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate data-ready={ready || undefined} className="flex flex-col gap-4" aria-label="Change password">
      <TextField
        label="Current password"
        type="password"
        autoComplete="current-password"
        error={errorFor('currentPassword')}
        {...form.register('currentPassword')}
      />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="10 to 72 characters."
        error={errorFor('newPassword')}
        {...form.register('newPassword')}
      />
      <TextField
        label="Repeat the new password"
        type="password"
        autoComplete="new-password"
        error={errorFor('confirmPassword')}
        {...form.register('confirmPassword')}
      />
      <FormMessage ok={state.ok} message={state.message} />
      <div>
        <SubmitButton pending={pending}>Change password</SubmitButton>
      </div>
    </form>
  );
}
