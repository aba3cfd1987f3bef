'use client';

import dynamic from 'next/dynamic';
import { useEffect, useState } from 'react';
import type { Config, Data, Layout } from 'plotly.js';
import { PLOT_COLOURS } from './plot-colours';

// Plotly is 1.4 MB gzipped: it is fetched only by pages that draw a plot, after the page itself is usable.
const Plot = dynamic(
  async () => {
    const [{ default: Plotly }, { default: createPlotlyComponent }] = await Promise.all([
      import('plotly.js-dist-min'),
      import('react-plotly.js/factory'),
    ]);
    return createPlotlyComponent(Plotly);
  },
  { ssr: false, loading: () => <div className="h-full w-full animate-pulse rounded-md bg-paper-sunk" /> },
);

const CONFIG: Partial<Config> = { displaylogo: false, responsive: true, modeBarButtonsToRemove: ['lasso2d', 'select2d'] };

export function PlotFrame({ title, data, layout, height = 280 }: { title: string; data: Data[]; layout: Partial<Layout>; height?: number }) {
  const [font, setFont] = useState('system-ui, sans-serif');
  // eslint-disable-next-line react-hooks/set-state-in-effect -- the page's font is known only once it is in the document
  useEffect(() => setFont(getComputedStyle(document.body).fontFamily), []);
  return (
    <figure className="flex flex-col gap-1 rounded-card bg-paper-raised p-3 shadow-card">
      <figcaption className="px-1 text-sm font-bold text-ink">{title}</figcaption>
      <div style={{ height }} className="w-full">
        <Plot
          data={data}
          layout={{
            autosize: true,
            margin: { l: 56, r: 16, t: 8, b: 44 },
            paper_bgcolor: 'rgba(0,0,0,0)',
            plot_bgcolor: 'rgba(0,0,0,0)',
            font: { family: font, size: 12, color: PLOT_COLOURS.ink },
            legend: { orientation: 'h', x: 0, y: -0.25, font: { size: 11 } },
            ...layout,
          }}
          config={CONFIG}
          useResizeHandler
          style={{ width: '100%', height: '100%' }}
        />
      </div>
    </figure>
  );
}
