'use client';

import { useEffect, useRef, useState } from 'react';
import type { Column } from '@tanstack/react-table';
import type { RegisterViewRow } from '@/lib/domain';
import { buttonStyles } from '@/components/ui/button';
import { controlStyle, Labelled } from '@/components/ui/labelled';

export function FilterSelect({ column, label, options }: { column: Column<RegisterViewRow, unknown> | undefined; label: string; options: { value: string; label: string }[] }) {
  return (
    <Labelled label={label} className="min-w-40 flex-[1_1_10rem]">
      {(id) => (
        <select
          id={id}
          className={controlStyle}
          value={(column?.getFilterValue() as string | undefined) ?? ''}
          onChange={(e) => column?.setFilterValue(e.target.value || undefined)}
        >
          <option value="">All</option>
          {options.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
      )}
    </Labelled>
  );
}

export function ColumnChooser({ columns }: { columns: Column<RegisterViewRow, unknown>[] }) {
  const [open, setOpen] = useState(false);
  const box = useRef<HTMLDetailsElement>(null);
  const summary = useRef<HTMLElement>(null);
  // A native disclosure stays open until its summary is pressed again; a menu-like panel should also close when the
  // user carries on elsewhere on the page.
  useEffect(() => {
    if (!open) return;
    const away = (e: PointerEvent) => {
      if (!box.current?.contains(e.target as Node)) setOpen(false);
    };
    document.addEventListener('pointerdown', away);
    return () => document.removeEventListener('pointerdown', away);
  }, [open]);
  const hideable = columns.filter((c) => c.getCanHide());
  const shown = hideable.filter((c) => c.getIsVisible()).length;
  return (
    <details
      ref={box}
      className="relative"
      open={open}
      onToggle={(e) => setOpen(e.currentTarget.open)}
      onKeyDown={(e) => {
        if (e.key === 'Escape' && open) {
          setOpen(false);
          summary.current?.focus();
        }
      }}
    >
      <summary ref={summary} className={`${buttonStyles.small} cursor-pointer list-none whitespace-nowrap [&::-webkit-details-marker]:hidden`}>
        Columns <span className="num font-normal text-ink-muted">({shown}/{hideable.length})</span>
      </summary>
      <fieldset className="absolute right-0 z-20 mt-1 flex w-64 flex-col gap-1.5 rounded-md border border-paper-rule bg-paper-raised p-3 shadow-card">
        <legend className="sr-only">Columns to show</legend>
        <p className="text-xs text-ink-muted">Tag and impact energy are always shown.</p>
        {hideable.map((c) => (
          <label key={c.id} className="flex items-center gap-2 text-sm">
            <input type="checkbox" checked={c.getIsVisible()} onChange={c.getToggleVisibilityHandler()} className="accent-cord-600" />
            {c.columnDef.header as string}
          </label>
        ))}
      </fieldset>
    </details>
  );
}

