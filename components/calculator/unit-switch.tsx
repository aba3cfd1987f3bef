'use client';

import type { UnitSystem } from '@/lib/domain';

const OPTIONS: { value: UnitSystem; label: string }[] = [
  { value: 'si', label: 'SI' },
  { value: 'us', label: 'US customary' },
];

export function UnitSwitch({ value, onChange }: { value: UnitSystem; onChange: (u: UnitSystem) => void }) {
  return (
    <div role="radiogroup" aria-label="Units" className="inline-flex rounded-md border border-paper-rule bg-paper-raised p-0.5">
      {OPTIONS.map((o) => (
        <button
          key={o.value}
          type="button"
          role="radio"
          aria-checked={value === o.value}
          onClick={() => onChange(o.value)}
          className={`rounded px-3 py-1 text-sm font-semibold ${value === o.value ? 'bg-cord-600 text-white' : 'text-ink-soft hover:bg-paper-sunk'}`}
        >
          {o.label}
        </button>
      ))}
    </div>
  );
}
