'use client';

import { organisationSettingsAction } from '@/lib/actions/members';
import { organisationSettingsSchema } from '@/lib/validation/organisation';
import { FormMessage, SubmitButton, TextField } from '@/components/forms/fields';
import { useActionForm } from '@/components/forms/use-action-form';

export function OrganisationSettingsForm({ name }: { name: string }) {
  const { form, state, pending, formAction, onSubmit, errorFor, ready } = useActionForm(
    organisationSettingsSchema,
    organisationSettingsAction,
    { name },
  );
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate data-ready={ready || undefined} className="flex flex-col gap-3" aria-label="Organisation settings">
      <TextField label="Organisation name" error={errorFor('name')} {...form.register('name')} />
      <FormMessage ok={state.ok} message={state.message} />
      <div>
        <SubmitButton pending={pending} tone="quiet">
          Rename
        </SubmitButton>
      </div>
    </form>
  );
}
