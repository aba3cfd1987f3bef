'use client';

import { updateProfileAction } from '@/lib/actions/profile';
import { profileSchema, type ProfileInput } from '@/lib/validation/user';
import { FormMessage, SelectField, SubmitButton, TextField } from '@/components/forms/fields';
import { useActionForm } from '@/components/forms/use-action-form';

const UNIT_OPTIONS = [
  { value: 'si', label: 'SI (m, kg, J, m/s)' },
  { value: 'us', label: 'US customary (ft, lb, ft·lbf, ft/s)' },
] as const;

export function ProfileForm({ defaults }: { defaults: ProfileInput }) {
  const { form, state, pending, formAction, onSubmit, errorFor, ready } = useActionForm(
    profileSchema,
    updateProfileAction,
    defaults,
  );
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate data-ready={ready || undefined} className="flex flex-col gap-4" aria-label="Profile">
      <TextField label="Name" autoComplete="name" error={errorFor('displayName')} {...form.register('displayName')} />
      <SelectField
        label="Units"
        hint="Used for every input and result you see."
        options={UNIT_OPTIONS}
        error={errorFor('unitSystem')}
        {...form.register('unitSystem')}
      />
      <FormMessage ok={state.ok} message={state.message} />
      <div>
        <SubmitButton pending={pending}>Save profile</SubmitButton>
      </div>
    </form>
  );
}
