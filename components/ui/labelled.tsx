import { useId, type ReactNode } from 'react';

/** A text box or select in a toolbar. */
export const controlStyle =
  'rounded-md border border-paper-rule bg-paper-raised px-2.5 py-1.5 text-sm text-ink outline-none focus:border-cord-500 focus:ring-2 focus:ring-cord-100';

/** A small label above (or beside) the control it names, tied to it by a generated id. */
export function Labelled({ label, inline = false, className = '', children }: {
  label: string;
  /** Label beside the control rather than above it. */
  inline?: boolean;
  className?: string;
  children: (id: string) => ReactNode;
}) {
  const id = useId();
  return (
    <div className={`flex ${inline ? 'items-center gap-2' : 'flex-col gap-1'} ${className}`}>
      <label htmlFor={id} className="text-xs font-semibold text-ink-soft">
        {label}
      </label>
      {children(id)}
    </div>
  );
}

