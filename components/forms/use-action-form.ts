'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { startTransition, useActionState, useEffect, useState } from 'react';
import { get, useForm, type DefaultValues, type FieldValues, type Path, type Resolver } from 'react-hook-form';
import type { z } from 'zod';
import { idle, type ActionState } from '@/lib/actions/state';

type Action = (prev: ActionState, form: FormData) => Promise<ActionState>;

/**
 * react-hook-form checks the shared zod schema as the user types; the server action checks it again and its
 * field errors show in the same place. Without JavaScript the form still posts to the action.
 */
export function useActionForm<S extends z.ZodType, TValues extends FieldValues & z.input<S>>(
  schema: S,
  action: Action,
  defaultValues: TValues,
) {
  const [state, formAction, pending] = useActionState(action, idle);
  // react-hook-form writes its defaults into the inputs when it mounts; `ready` tells tests (and styles) when typing is safe.
  const [ready, setReady] = useState(false);
  // eslint-disable-next-line react-hooks/set-state-in-effect -- the point is one render before mount and one after
  useEffect(() => setReady(true), []);
  const form = useForm<TValues>({
    // The schema reads more than the form sends (JSON numbers as well as text), so its input type is wider than
    // TValues; the resolver's generics ask for them to be equal, which the constraint on TValues stands in for.
    resolver: zodResolver(schema as never) as unknown as Resolver<TValues>,
    mode: 'onTouched',
    defaultValues: defaultValues as DefaultValues<TValues>,
  });

  const onSubmit = form.handleSubmit((_values, event) => {
    const element = (event?.target as HTMLFormElement | undefined) ?? null;
    if (!element) return;
    const data = new FormData(element);
    startTransition(() => formAction(data));
  });

  const errorFor = (name: Path<TValues>): string | undefined => {
    // Nested names ("dimensions.length") address nested errors; `get` walks the dotted path.
    const client = (get(form.formState.errors, name) as { message?: unknown } | undefined)?.message;
    return typeof client === 'string' ? client : state.errors?.[name];
  };

  return { form, state, pending, formAction, onSubmit, errorFor, ready };
}
