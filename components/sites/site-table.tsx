import Link from 'next/link';
import { type ConsequenceLevel, LADDER_COLOURS, SITE_KIND_LABELS, SURFACE_LABELS, type UnitSystem } from '@/lib/domain';
import type { SiteListing } from '@/db/sites';
import { formatQuantity } from '@/lib/units';

/** Register lines per consequence level: each chip names its level in text, the swatch only repeats it in colour. */
function LadderCounts({ counts, ladder }: { counts: Record<string, number>; ladder: ConsequenceLevel[] }) {
  const present = ladder.filter((l) => counts[l.id]);
  if (!present.length) return <span className="text-ink-muted">—</span>;
  return (
    <ul className="flex flex-wrap gap-1.5">
      {present
        .slice()
        .reverse()
        .map((l) => (
          <li key={l.id} className="flex items-center gap-1 rounded border border-paper-rule px-1.5 py-0.5 text-xs" data-testid="level-chip">
            <span aria-hidden className="inline-block h-2.5 w-2.5 shrink-0 rounded-sm" style={{ backgroundColor: LADDER_COLOURS[l.colour].hex }} />
            <span>{l.name}:</span>
            <span className="num font-semibold">{counts[l.id]}</span>
          </li>
        ))}
    </ul>
  );
}

export function SiteTable({ sites, ladder, units }: { sites: SiteListing[]; ladder: ConsequenceLevel[]; units: UnitSystem }) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm">
        <thead className="text-xs uppercase tracking-wide text-ink-muted">
          <tr>
            <th className="pb-2 pr-3 font-semibold">Site</th>
            <th className="hidden pb-2 pr-3 font-semibold lg:table-cell">Kind</th>
            <th className="pb-2 pr-3 text-right font-semibold">Levels</th>
            <th className="pb-2 pr-3 text-right font-semibold">Items</th>
            <th className="pb-2 pr-3 text-right font-semibold">Highest impact energy</th>
            <th className="pb-2 font-semibold">Lines by consequence level</th>
          </tr>
        </thead>
        <tbody>
          {sites.map((s) => (
            <tr key={s.id} className="border-t border-paper-rule align-top">
              <td className="py-3 pr-3">
                <Link href={`/sites/${s.id}`} className="font-semibold text-cord-600 underline-offset-2 hover:underline">
                  {s.name}
                </Link>
                <span className="block text-xs text-ink-muted">
                  <span className="lg:hidden">{SITE_KIND_LABELS[s.kind]} · </span>
                  {s.location ? `${s.location} · ` : ''}over {SURFACE_LABELS[s.surface].toLowerCase()} · wind{' '}
                  <span className="num">{formatQuantity('speed', s.design_wind_m_s, units)}</span>
                </span>
              </td>
              <td className="hidden py-3 pr-3 lg:table-cell">{SITE_KIND_LABELS[s.kind]}</td>
              <td className="num py-3 pr-3 text-right">{s.level_count}</td>
              <td className="py-3 pr-3 text-right">
                <span className="num">{s.item_count}</span>
                <span className="block text-xs text-ink-muted">
                  on <span className="num">{s.line_count}</span> line{s.line_count === 1 ? '' : 's'}
                </span>
              </td>
              <td className="num py-3 pr-3 text-right">{s.max_energy_j === null ? '—' : formatQuantity('energy', s.max_energy_j, units)}</td>
              <td className="py-3">
                <LadderCounts counts={s.by_consequence} ladder={ladder} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
