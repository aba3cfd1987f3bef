'use client';

import Link from 'next/link';
import { signInAction } from '@/lib/actions/auth';
import { signInSchema } from '@/lib/validation/user';
import { FormMessage, SubmitButton, TextField } from '@/components/forms/fields';
import { useActionForm } from '@/components/forms/use-action-form';

/** `next` is the page to return to, already checked to be a path of this app; the action checks it again. */
export function SignInForm({ next }: { next: string }) {
  const { form, state, pending, formAction, onSubmit, errorFor, ready } = useActionForm(signInSchema, signInAction, {
    email: '',
    password: '',
  });
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate data-ready={ready || undefined} className="flex flex-col gap-4">
      <FormMessage ok={state.ok} message={state.message} />
      {next !== '/' ? <input type="hidden" name="next" value={next} /> : null}
      <TextField label="E-mail" type="email" autoComplete="username" error={errorFor('email')} {...form.register('email')} />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={errorFor('password')}
        {...form.register('password')}
      />
      <SubmitButton pending={pending}>Sign in</SubmitButton>
      <p className="text-sm text-ink-muted">
        New to Plumbline?{' '}
        <Link href="/sign-up" className="font-semibold text-cord-600 underline">
          Set up your organisation
        </Link>
      </p>
    </form>
  );
}
