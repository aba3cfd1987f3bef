'use client';

import Link from 'next/link';
import { signUpAction } from '@/lib/actions/auth';
import { signUpSchema } from '@/lib/validation/user';
import { FormMessage, SubmitButton, TextField } from '@/components/forms/fields';
import { useActionForm } from '@/components/forms/use-action-form';

export function SignUpForm() {
  const { form, state, pending, formAction, onSubmit, errorFor, ready } = useActionForm(signUpSchema, signUpAction, {
    organisationName: '',
    displayName: '',
    email: '',
    password: '',
  });
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate data-ready={ready || undefined} className="flex flex-col gap-4">
      <FormMessage ok={state.ok} message={state.message} />
      <TextField
        label="Organisation"
        hint="Your company or project team; you become its admin."
        autoComplete="organization"
        error={errorFor('organisationName')}
        {...form.register('organisationName')}
      />
      <TextField label="Your name" autoComplete="name" error={errorFor('displayName')} {...form.register('displayName')} />
      <TextField label="E-mail" type="email" autoComplete="email" error={errorFor('email')} {...form.register('email')} />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="10 to 72 characters."
        error={errorFor('password')}
        {...form.register('password')}
      />
      <SubmitButton pending={pending}>Create organisation</SubmitButton>
      <p className="text-sm text-ink-muted">
        Have an account?{' '}
        <Link href="/sign-in" className="font-semibold text-cord-600 underline">
          Sign in
        </Link>
      </p>
    </form>
  );
}
