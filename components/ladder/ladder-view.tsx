import { type ConsequenceLevel, LADDER_COLOURS, type UnitSystem } from '@/lib/domain';
import { ladderInOrder } from '@/components/register/ladder';
import { formatNumber, formatQuantity } from '@/lib/units';

/** A bound as the admin typed it in joules (not rounded to three figures), with the user's units beside it. */
function Bound({ joules, units }: { joules: number; units: UnitSystem }) {
  return (
    <>
      <span className="num">{formatNumber(joules, 6)} J</span>
      {units === 'us' && joules > 0 ? <span className="num text-ink-muted"> ({formatQuantity('energy', joules, 'us')})</span> : null}
    </>
  );
}

/**
 * The ladder read from the top down, as a person standing below looks up at it: the colour column on the left is
 * one continuous bar, so the levels read as a single scale rather than separate labels.
 */
export function LadderView({ ladder, units }: { ladder: ConsequenceLevel[]; units: UnitSystem }) {
  const lowestFirst = ladderInOrder(ladder);
  const topDown = [...lowestFirst].reverse();
  if (!topDown.length) return <p className="text-sm text-ink-muted">This organisation has no consequence ladder yet.</p>;

  return (
    <figure className="flex flex-col gap-3">
      <figcaption className="max-w-3xl text-sm text-ink-muted">
        Highest level first. Each level covers the impact energies from its bound up to the bound of the level above.
        The bounds are published test conditions and criteria, not safe limits: an impact below a bound is not safe
        because of it.
      </figcaption>
      <ol className="flex flex-col" aria-label={`${topDown.length} consequence levels, highest first`}>
        {topDown.map((level, i) => {
          const colour = LADDER_COLOURS[level.colour];
          const above = topDown[i - 1];
          const first = i === 0;
          const last = i === topDown.length - 1;
          return (
            <li key={level.id} className="grid grid-cols-[3rem_1fr] gap-x-4 sm:grid-cols-[3.5rem_1fr]">
              <div
                aria-hidden
                className={`flex items-start justify-center pt-3 text-sm font-bold ${first ? 'rounded-t-md' : 'border-t border-white/60'} ${last ? 'rounded-b-md' : ''}`}
                style={{ backgroundColor: colour.hex, color: colour.text }}
              >
                <span className="num">{level.rank}</span>
              </div>
              <div className={`flex flex-col gap-1 py-3 ${last ? '' : 'border-b border-paper-rule'}`}>
                <div className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
                  <h3 className="text-base font-bold text-ink">
                    {level.name}
                    <span className="sr-only">, level {level.rank}, colour {colour.label}</span>
                  </h3>
                  <p className="text-sm text-ink-soft">
                    from <Bound joules={level.lower_bound_j} units={units} />
                    {above ? (
                      <>
                        {' '}
                        to below <Bound joules={above.lower_bound_j} units={units} />
                      </>
                    ) : (
                      ' and above'
                    )}
                  </p>
                </div>
                {level.guidance ? (
                  <p className="max-w-3xl text-sm text-ink-soft">
                    <span className="font-semibold text-ink">Calls for: </span>
                    {level.guidance}
                  </p>
                ) : (
                  <p className="text-sm italic text-ink-muted">No guidance written for this level.</p>
                )}
                {level.source ? <p className="max-w-3xl text-xs text-ink-muted">Bound: {level.source}</p> : null}
              </div>
            </li>
          );
        })}
      </ol>
    </figure>
  );
}
