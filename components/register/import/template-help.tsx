import { DIMENSIONS, type UnitSystem } from '@/lib/domain';

/** How to write the file: the templates, required and optional columns, and units in the headers. */
export function TemplateHelp({ siteId, units, levelNames }: { siteId: string; units: UnitSystem; levelNames: string[] }) {
  const either = (si: string, us: string) => (
    <>
      <code className="num">{units === 'si' ? si : us}</code> or <code className="num">{units === 'si' ? us : si}</code>
    </>
  );
  const templates = [
    { units: 'si' as const, label: 'Metric template', detail: 'kg, m' },
    { units: 'us' as const, label: 'US customary template', detail: 'lb, ft' },
  ].sort((a, b) => Number(b.units === units) - Number(a.units === units));
  return (
    <div className="flex flex-col gap-2 rounded-md border border-paper-rule px-4 py-3 text-sm text-ink-soft">
      <p className="flex flex-wrap items-center gap-x-3 gap-y-1">
        <span className="font-semibold text-ink">Start from a template:</span>
        {templates.map((t) => (
          <a key={t.units} href={`/sites/${encodeURIComponent(siteId)}/import/template?units=${t.units}`} download className="font-semibold text-cord-600 underline hover:text-cord-700">
            {t.label} <span className="font-normal text-ink-muted">({t.detail})</span>
          </a>
        ))}
      </p>
      <p>
        The first row names the columns. Required: <code>tag</code>, <code>description</code>, <code>category</code>, mass,{' '}
        <code>shape</code>, <code>level</code> and <code>securing</code>. Optional: <code>quantity</code>, dimensions,{' '}
        <code>cd</code> (drag coefficient), area, volume, height, <code>last_inspected</code> and <code>notes</code>.
      </p>
      <p>
        Units go in the header, so each column says what its numbers mean: {either('mass_kg', 'mass_lb')},{' '}
        {either('height_m', 'height_ft')}, {either('dim_length_m', 'dim_length_ft')} (dimensions are{' '}
        {DIMENSIONS.map((d, i) => (
          <span key={d}>
            {i ? (i === DIMENSIONS.length - 1 ? ' or ' : ', ') : ''}
            <code>dim_{d}</code>
          </span>
        ))}
        ), {either('area_m2', 'area_ft2')}, {either('volume_m3', 'volume_ft3')}. Result columns from an export are accepted and
        ignored: falls are computed again on import.
      </p>
      <p>
        Each tag must be new to this site.{' '}
        {levelNames.length ? (
          <>
            Level names must match this site’s levels (capitals do not matter):{' '}
            <span className="font-semibold text-ink">{levelNames.join(', ')}</span>.
          </>
        ) : (
          <>This site has no levels yet, and every item names the level it is on: add the site’s levels before importing.</>
        )}
      </p>
    </div>
  );
}
