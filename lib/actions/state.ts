/** What every server action hands back to useActionState. */
export interface ActionState {
  ok?: boolean;
  message?: string;
  errors?: Record<string, string>;
  /** Shown once, e.g. a new member's temporary password. */
  secret?: string;
}

export const idle: ActionState = {};
