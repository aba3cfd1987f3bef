'use client';

import { useMemo } from 'react';
import { PlotFrame } from '@/components/calculator/plot-frame';
import { buildEnergyFigure, type EnergyFigureInput } from './energy-figure';

/** Each item's effective impact energy as a marker on its level's row, against the consequence ladder's bounds. */
export function EnergyByLevelPlot(props: EnergyFigureInput) {
  const { rows, ladder, levels, units } = props;
  const figure = useMemo(() => buildEnergyFigure({ rows, ladder, levels, units }), [rows, ladder, levels, units]);
  const { withoutResult, atZero } = figure;
  const plural = (x: number) => `${x.toLocaleString('en-GB')} item${x === 1 ? '' : 's'}`;

  if (figure.plotted === 0) {
    return (
      <figure className="flex flex-col gap-1 rounded-card bg-paper-raised p-5 shadow-card">
        <figcaption className="text-sm font-bold text-ink">Impact energy of each item, by level</figcaption>
        <p className="text-sm text-ink-muted">
          {rows.length === 0 ? 'No items on the register yet.' : 'No item has a computed impact energy to plot yet.'}
        </p>
      </figure>
    );
  }

  return (
    <div className="flex flex-col gap-1.5">
      <PlotFrame
        title="Impact energy of each item, by level"
        data={figure.data}
        layout={figure.layout}
        height={Math.max(300, 140 + figure.strips * 44)}
      />
      <p className="px-1 text-xs text-ink-muted">
        One marker per register line; markers spread a little up and down within a level only so that close energies
        stay visible. Dashed lines mark where each consequence level begins.
        {withoutResult > 0 ? ` ${plural(withoutResult)} without a result ${withoutResult === 1 ? 'is' : 'are'} not shown.` : ''}
        {atZero > 0 ? ` ${plural(atZero)} at zero energy ${atZero === 1 ? 'is' : 'are'} not shown (a logarithmic scale has no zero).` : ''}
      </p>
    </div>
  );
}
