'use client';

import { useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes, type TextareaHTMLAttributes } from 'react';

interface FieldShellProps {
  id: string;
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  children: ReactNode;
}

function FieldShell({ id, label, hint, error, children }: FieldShellProps) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-semibold text-ink-soft">
        {label}
      </label>
      {children}
      {hint && !error ? (
        <p id={`${id}-hint`} className="text-xs text-ink-muted">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={`${id}-error`} role="alert" className="text-sm font-semibold text-flare-700">
          {error}
        </p>
      ) : null}
    </div>
  );
}

const control =
  'w-full rounded-md border bg-paper-raised px-3 py-2 text-[15px] text-ink shadow-inner outline-none transition ' +
  'focus:border-cord-500 focus:ring-2 focus:ring-cord-100 disabled:bg-paper-sunk';

function describedBy(id: string, hint: unknown, error?: string) {
  return error ? `${id}-error` : hint ? `${id}-hint` : undefined;
}

type TextFieldProps = InputHTMLAttributes<HTMLInputElement> & {
  label: string;
  hint?: ReactNode;
  error?: string;
  /** A unit printed inside the right end of the box, e.g. "m/s". */
  suffix?: string;
};

export function TextField({ label, hint, error, suffix, className = '', ...input }: TextFieldProps) {
  const id = useId();
  const box = (
    <input
      id={id}
      aria-invalid={error ? true : undefined}
      aria-describedby={describedBy(id, hint, error)}
      className={`${control} ${error ? 'border-flare-500' : 'border-paper-rule'} ${suffix ? 'num' : ''} ${className}`}
      style={suffix ? { paddingRight: `${0.9 + suffix.length * 0.55}rem` } : undefined}
      {...input}
    />
  );
  return (
    <FieldShell
      id={id}
      label={
        <>
          {label}
          {suffix ? <span className="sr-only"> ({suffix})</span> : null}
        </>
      }
      hint={hint}
      error={error}
    >
      {suffix ? (
        <div className="relative">
          {box}
          <span aria-hidden className="pointer-events-none absolute inset-y-0 right-2.5 flex items-center text-sm text-ink-muted">
            {suffix}
          </span>
        </div>
      ) : (
        box
      )}
    </FieldShell>
  );
}

type SelectFieldProps = SelectHTMLAttributes<HTMLSelectElement> & {
  label: string;
  hint?: ReactNode;
  error?: string;
  options: readonly { value: string; label: string }[];
};

export function SelectField({ label, hint, error, options, className = '', ...select }: SelectFieldProps) {
  const id = useId();
  return (
    <FieldShell id={id} label={label} hint={hint} error={error}>
      <select
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, hint, error)}
        className={`${control} ${error ? 'border-flare-500' : 'border-paper-rule'} ${className}`}
        {...select}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </FieldShell>
  );
}

type TextAreaFieldProps = TextareaHTMLAttributes<HTMLTextAreaElement> & { label: string; hint?: ReactNode; error?: string };

export function TextAreaField({ label, hint, error, className = '', rows = 3, ...area }: TextAreaFieldProps) {
  const id = useId();
  return (
    <FieldShell id={id} label={label} hint={hint} error={error}>
      <textarea
        id={id}
        rows={rows}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, hint, error)}
        className={`${control} ${error ? 'border-flare-500' : 'border-paper-rule'} ${className}`}
        {...area}
      />
    </FieldShell>
  );
}

export function SubmitButton({ pending, children, tone = 'primary' }: { pending: boolean; children: ReactNode; tone?: 'primary' | 'quiet' | 'danger' }) {
  const tones = {
    primary: 'bg-cord-600 text-white hover:bg-cord-700',
    quiet: 'border border-paper-rule bg-paper-raised text-ink hover:bg-paper-sunk',
    danger: 'border border-flare-500 bg-paper-raised text-flare-700 hover:bg-flare-50',
  } as const;
  return (
    <button
      type="submit"
      disabled={pending}
      aria-busy={pending || undefined}
      className={`inline-flex items-center justify-center rounded-md px-4 py-2 text-sm font-semibold transition disabled:opacity-60 ${tones[tone]}`}
    >
      {pending ? 'Working…' : children}
    </button>
  );
}

export function FormMessage({ ok, message }: { ok?: boolean; message?: string }) {
  if (!message) return null;
  return (
    <p
      role={ok ? 'status' : 'alert'}
      className={`rounded-md px-3 py-2 text-sm ${ok ? 'bg-moss-50 text-moss-700' : 'bg-flare-50 text-flare-700'}`}
    >
      {message}
    </p>
  );
}
