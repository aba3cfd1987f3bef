// Button looks shared by the client components; a class string rather than a component, so a <button>, a <summary> or a
// link can wear it.
const base =
  'inline-flex items-center justify-center rounded-md px-4 py-2 text-sm font-semibold transition disabled:cursor-not-allowed disabled:opacity-50';

export const buttonStyles = {
  /** The one action a panel leads with. */
  primary: `${base} bg-cord-600 text-white hover:bg-cord-700 disabled:hover:bg-cord-600`,
  /** Secondary actions beside a primary one. */
  quiet: `${base} border border-paper-rule bg-paper-raised text-ink hover:bg-paper-sunk disabled:hover:bg-paper-raised`,
  /** Toolbars and pagers, where several sit in a row. */
  small:
    'rounded-md border border-paper-rule bg-paper-raised px-3 py-1.5 text-sm font-semibold text-ink hover:bg-paper-sunk disabled:cursor-not-allowed disabled:opacity-50',
} as const;
