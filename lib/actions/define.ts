import { revalidatePath } from 'next/cache';
import { redirect } from 'next/navigation';
import type { z } from 'zod';
import type { Member } from '@/db/types';
import { requireRole } from '@/lib/auth';
import { rolesFor, type Action } from '@/lib/auth/policy';
import type { UnitSystem } from '@/lib/domain';
import { ConflictError, NotFoundError, UnavailableError } from '@/lib/errors';
import { readForm } from '@/lib/validation/input';
import { toFieldErrors } from '@/lib/validation/issues';
import { unitsField } from '@/lib/validation/quantity';
import { outageSafe } from './outage';
import type { ActionState } from './state';

/** The one message of a form whose fields did not pass its schema; the fields carry the details. */
export const CHECK_FIELDS = 'Check the highlighted fields.';

/** What an action's body knows besides its parsed input. */
export interface ActionContext<A extends Allow = Action> {
  member: A extends 'public' ? null : Member;
  /** The form's text fields as posted (null prototype), for ids and other names outside the schema. */
  fields: Record<string, string>;
  /** The unit system the form's numbers were typed in ("units" field; SI when absent or unknown). */
  units: UnitSystem;
}

/** What the body hands back: the form's new state, and what to revalidate and where to go after. */
export interface Outcome extends ActionState {
  revalidate?: string | [path: string, type: 'layout' | 'page'];
  redirect?: string;
}

type Allow = Action | 'any' | 'public';

interface ActionSpec<S extends z.ZodType, A extends Allow> {
  /**
   * Who may run it: an action of lib/auth/policy.ts, or 'any' signed-in member, checked before the form is read; or
   * 'public' for the two forms a signed-out visitor may post (sign-in, sign-up), whose context has no member.
   */
  allow: A;
  /** The entity's schema, or a function of the unit system for schemas that read typed quantities. */
  schema?: S | ((units: UnitSystem) => S);
  /** Dotted field names ("dimensions.length", "levels.0.name") become nested objects and lists before parsing. */
  nested?: boolean;
  /** Shapes the read form before the schema sees it (e.g. a ladder form with no rungs posts no "levels"). */
  prepare?: (values: Record<string, unknown>) => unknown;
  /** The message when the thing acted on is gone (NotFoundError); without it a NotFoundError is a fault. */
  notFound?: string | ((context: ActionContext<A>) => string);
  run: (input: z.output<S>, context: ActionContext<A>) => Promise<Outcome>;
}

function known(error: unknown, notFound: string | undefined): ActionState {
  if (error instanceof ConflictError) return { errors: { [error.field]: error.message }, message: error.message };
  if (error instanceof NotFoundError && notFound) return { message: notFound };
  if (error instanceof UnavailableError) return { message: error.message };
  throw error;
}

/**
 * Every server action that takes a form is built here, in this order: role check (requireRole with the policy's
 * roles, so a visitor without the role reads nothing of the form), read the form through
 * lib/validation/input (refused field names fail like any field), parse with the schema, run the body, then
 * revalidate and redirect. Known errors become the form's message; a database outage becomes the outage message.
 */
export function defineAction<S extends z.ZodType = z.ZodUnknown, A extends Allow = Allow>(spec: ActionSpec<S, A>) {
  const action = async (_prev: ActionState, form: FormData): Promise<ActionState> => {
    const allow: Allow = spec.allow;
    const member = allow === 'public' ? null : await requireRole(allow === 'any' ? 'any' : rolesFor(allow));
    const read = readForm(form, spec.nested);
    if (!read.success) return { errors: toFieldErrors(read.error), message: CHECK_FIELDS };
    const { fields, values } = read;
    const units = unitsField.safeParse(fields.units);
    const context = { member, fields, units: units.success ? units.data : 'si' } as ActionContext<A>;

    let input: z.output<S> = undefined as z.output<S>;
    if (spec.schema) {
      const schema = typeof spec.schema === 'function' ? spec.schema(context.units) : spec.schema;
      const parsed = schema.safeParse(spec.prepare ? spec.prepare(values) : values);
      if (!parsed.success) return { errors: toFieldErrors(parsed.error), message: CHECK_FIELDS };
      input = parsed.data;
    }

    let outcome: Outcome;
    try {
      outcome = await spec.run(input, context);
    } catch (error) {
      return known(error, typeof spec.notFound === 'function' ? spec.notFound(context) : spec.notFound);
    }
    const { revalidate, redirect: to, ...state } = outcome;
    if (typeof revalidate === 'string') revalidatePath(revalidate);
    else if (revalidate) revalidatePath(...revalidate);
    // redirect() throws Next's redirect signal, so it comes last and outside the error mapping.
    if (to) redirect(to);
    return state;
  };
  // Signed-out forms change nothing a member could lose, so an outage there stays the error page it always was.
  return spec.allow === 'public' ? action : outageSafe(action);
}
