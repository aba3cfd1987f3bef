/** The caution that travels with every result Plumbline shows. */
export function SafetyNote({ compact = false }: { compact?: boolean }) {
  return (
    <aside
      aria-label="Safety caution"
      className={`rounded-card border-l-4 border-brass-500 bg-brass-50 text-ink-soft ${compact ? 'px-3 py-2 text-xs' : 'px-4 py-3 text-sm'}`}
    >
      <strong className="font-semibold text-ink">For planning, not certification.</strong> Plumbline&apos;s figures are
      estimates from idealised physics: real objects bounce, deflect, break up and tumble. Exclusion zones, tethering
      and protection must follow local codes, site rules and the assessment of a competent person. A helmet rating is
      not permission to work below a suspended load.
    </aside>
  );
}
