'use client';

import type { Data } from 'plotly.js';
import type { UnitSystem } from '@/lib/domain';
import type { DropCase, DropResult } from '@/lib/physics';
import { REFERENCE_ENERGIES } from '@/lib/domain/reference-energies';
import { formatQuantity, fromSI, unitLabel } from '@/lib/units';
import { PLOT_COLOURS as C } from './plot-colours';
import { PlotFrame } from './plot-frame';

interface Props {
  result: DropResult;
  dropCase: DropCase;
  units: UnitSystem;
}

const axis = (title: string, extra: object = {}) => ({
  title: { text: title, standoff: 6 },
  gridcolor: C.rule,
  zerolinecolor: C.muted,
  ...extra,
});

export function SpeedPlot({ result, units }: Props) {
  const s = result.samples;
  if (!s) return null;
  const v = (x: number) => fromSI('speed', x, units);
  const closed = s.closed_form_speed;
  const data: Data[] = [
    { x: s.t, y: s.speed.map(v), name: 'Integrated', mode: 'lines', line: { color: C.cord, width: 3 } },
  ];
  if (closed) {
    data.push({ x: s.t, y: closed.map(v), name: 'Closed form', mode: 'lines', line: { color: C.brass, width: 2, dash: 'dot' } });
  }
  if (result.terminal_speed_m_s) {
    data.push({
      x: [0, result.fall_time_s],
      y: [v(result.terminal_speed_m_s), v(result.terminal_speed_m_s)],
      name: 'Terminal speed',
      mode: 'lines',
      line: { color: C.muted, width: 1.5, dash: 'dash' },
    });
  }
  return (
    <PlotFrame
      title="Speed against time"
      data={data}
      layout={{ xaxis: axis('time (s)'), yaxis: axis(`speed (${unitLabel('speed', units)})`, { rangemode: 'tozero' }) }}
    />
  );
}

export function HeightPlot({ result, units }: Props) {
  const s = result.samples;
  if (!s) return null;
  const data: Data[] = [
    { x: s.t, y: s.y.map((y) => fromSI('length', y, units)), name: 'Height', mode: 'lines', line: { color: C.cord, width: 3 }, showlegend: false },
  ];
  return (
    <PlotFrame
      title="Height above the impact surface against time"
      data={data}
      layout={{ xaxis: axis('time (s)'), yaxis: axis(`height (${unitLabel('length', units)})`, { rangemode: 'tozero' }) }}
    />
  );
}

export function PathPlot({ result, dropCase, units }: Props) {
  const s = result.samples;
  if (!s) return null;
  const L = (m: number) => fromSI('length', m, units);
  const xs = s.x.map(L);
  const ys = s.y.map(L);
  const top = Math.max(...ys, 0.001);
  const span = Math.max(Math.abs(Math.min(...xs)), Math.abs(Math.max(...xs)), top * 0.15);
  const shapes: NonNullable<Parameters<typeof PlotFrame>[0]['layout']['shapes']> = [
    { type: 'line', x0: -span * 0.2, x1: span * 1.2, y0: 0, y1: 0, line: { color: C.ink, width: 2 } },
  ];
  const annotations: NonNullable<Parameters<typeof PlotFrame>[0]['layout']['annotations']> = [];
  const liquid = result.layers.find((l) => l.phase === 'liquid');
  if (liquid && result.layers.length > 1) {
    shapes.push({ type: 'rect', x0: -span * 0.2, x1: span * 1.2, y0: 0, y1: L(liquid.top_m), fillcolor: C.water, opacity: 0.5, line: { width: 0 }, layer: 'below' });
    annotations.push({ x: span * 1.2, y: L(liquid.top_m), text: 'water surface', showarrow: false, xanchor: 'right', yanchor: 'bottom', font: { size: 11, color: C.cord } });
  }
  const flow = dropCase.layers ? (dropCase.layers[0].flow_m_s ?? 0) : (dropCase.wind_m_s ?? 0);
  if (flow !== 0) {
    annotations.push({
      x: span * 0.55,
      y: top * 1.02,
      ax: flow > 0 ? -60 : 60,
      ay: 0,
      text: `${result.layers[0]?.phase === 'liquid' ? 'current' : 'wind'} ${formatQuantity('speed', Math.abs(flow), units, 2)}`,
      showarrow: true,
      arrowhead: 3,
      arrowsize: 1.2,
      arrowcolor: C.brass,
      font: { size: 11, color: C.brass },
      xanchor: 'left',
    });
  }
  const data: Data[] = [
    { x: xs, y: ys, name: 'Path', mode: 'lines', line: { color: C.cord, width: 3 }, showlegend: false },
    { x: [xs[xs.length - 1]], y: [0], mode: 'markers', marker: { color: C.flare, size: 11, symbol: 'x' }, name: 'Impact', showlegend: false },
  ];
  return (
    <PlotFrame
      title="Side view of the path"
      data={data}
      layout={{
        xaxis: axis(`drift (${unitLabel('length', units)})`, { range: [-span * 0.2, span * 1.2] }),
        yaxis: axis(`height (${unitLabel('length', units)})`, { range: [-top * 0.03, top * 1.1] }),
        shapes,
        annotations,
      }}
    />
  );
}

/** The impact energy on a logarithmic ruler of published reference energies. */
export function EnergyScale({ result, units }: Props) {
  const E = (j: number) => fromSI('energy', j, units);
  const energy = result.effective_impact_energy_j;
  const refs = REFERENCE_ENERGIES;
  const data: Data[] = [
    {
      x: refs.map((r) => E(r.energy_j)),
      y: refs.map((_, i) => i + 1),
      mode: 'text+markers',
      text: refs.map((r) => `${r.label} — ${formatQuantity('energy', r.energy_j, units)}`),
      // The highest mark's label goes to its left, where the axis has room.
      textposition: refs.map((_, i) => (i === refs.length - 1 ? 'middle left' : 'middle right')),
      hovertext: refs.map((r) => r.source),
      hoverinfo: 'text',
      marker: { color: C.muted, size: 8, symbol: 'line-ns-open', line: { width: 2, color: C.muted } },
      textfont: { size: 11, color: C.ink },
      showlegend: false,
    },
    {
      x: [E(result.vacuum.impact_energy_j)],
      y: [0],
      mode: 'markers',
      name: `Vacuum m·g·h: ${formatQuantity('energy', result.vacuum.impact_energy_j, units)}`,
      marker: { color: 'rgba(0,0,0,0)', size: 14, symbol: 'diamond', line: { color: C.brass, width: 2 } },
    },
    {
      x: [E(energy)],
      y: [0],
      mode: 'markers',
      name: `This drop: ${formatQuantity('energy', energy, units)}`,
      marker: { color: C.brass, size: 16, symbol: 'diamond' },
    },
  ];
  const values = [...refs.map((r) => r.energy_j), energy, result.vacuum.impact_energy_j].filter((x) => x > 0).map(E);
  // Room on the right for the labels that sit beside each reference mark.
  const lo = Math.log10(Math.min(...values)) - 0.5;
  const hi = Math.log10(Math.max(...values)) + 1.6;
  return (
    <PlotFrame
      title="Impact energy among published reference energies"
      height={300}
      data={data}
      layout={{
        xaxis: axis(`energy (${unitLabel('energy', units)}, logarithmic)`, { type: 'log', range: [lo, hi], dtick: 1 }),
        yaxis: { visible: false, range: [-0.8, refs.length + 0.6] },
        shapes: refs.map((r, i) => ({ type: 'line', x0: E(r.energy_j), x1: E(r.energy_j), y0: 0, y1: i + 1, line: { color: C.rule, width: 1 } })),
        legend: { orientation: 'h', x: 0, y: -0.28, font: { size: 11 } },
      }}
    />
  );
}
