import type { Annotation, Data, Layout, Shape } from 'plotly.js';
import { type ConsequenceLevel, LADDER_COLOURS, type RegisterViewRow, type SiteLevelRef, type UnitSystem } from '@/lib/domain';
import { PLOT_COLOURS as C } from '@/components/calculator/plot-colours';
import { plotText } from '@/lib/plot-text';
import { formatQuantity, fromSI, unitLabel } from '@/lib/units';
import { ladderInOrder } from './ladder';

export interface EnergyFigureInput {
  rows: RegisterViewRow[];
  ladder: ConsequenceLevel[];
  levels: SiteLevelRef[];
  units: UnitSystem;
}

const UNCLASSIFIED = '__unclassified';
/** Marker shapes by rung, so the consequence level reads without telling colours apart. */
const SYMBOLS = ['circle', 'square', 'diamond', 'triangle-up', 'pentagon', 'hexagon', 'star', 'hourglass'] as const;
const GOLDEN = 0.6180339887498949;
/**
 * The golden-ratio sequence fills a row's height evenly and depends only on the item's place in the register, so
 * the same register always draws the same way.
 */
const jitter = (index: number) => (((index * GOLDEN) % 1) - 0.5) * 0.6;

interface Bucket {
  x: number[];
  y: number[];
  text: string[];
}

/** The energy plot's traces and layout; every text a member wrote goes through plotText. */
export function buildEnergyFigure({ rows, ladder, levels, units }: EnergyFigureInput) {
  const ordered = ladderInOrder(ladder);
  const E = (j: number) => fromSI('energy', j, units);

  // Plotly puts the first category at the bottom: levels go lowest first, so the highest floor is drawn on top.
  // Levels the page did not pass (there should be none) sit below the known ones rather than vanish.
  const known = [...levels].sort((a, b) => a.floor_height_m - b.floor_height_m);
  const knownIds = new Set(known.map((l) => l.id));
  const strays = new Map<string, string>();
  for (const r of rows) if (!knownIds.has(r.level_id)) strays.set(r.level_id, r.level_name);
  const strips = [
    ...[...strays].map(([id, name]) => ({ id, label: name })),
    ...known.map((l) => ({ id: l.id, label: `${l.name} · ${formatQuantity('length', l.floor_height_m, units)}` })),
  ];
  const stripIndex = new Map(strips.map((s, i) => [s.id, i]));

  const buckets = new Map<string, Bucket>();
  const rungName = new Map(ordered.map((l) => [l.id, l.name]));
  let withoutResult = 0;
  let atZero = 0;
  rows.forEach((r, i) => {
    const energy = r.effective_energy_j;
    if (energy === null) {
      withoutResult += 1;
      return;
    }
    if (!(energy > 0)) {
      atZero += 1;
      return;
    }
    const key = r.consequence_level_id && rungName.has(r.consequence_level_id) ? r.consequence_level_id : UNCLASSIFIED;
    const bucket = buckets.get(key) ?? { x: [], y: [], text: [] };
    buckets.set(key, bucket);
    bucket.x.push(E(energy));
    bucket.y.push((stripIndex.get(r.level_id) ?? 0) + jitter(i));
    bucket.text.push(
      [
        `<b>${plotText(r.tag)}</b>${r.quantity > 1 ? ` × ${r.quantity}` : ''} · ${plotText(r.description)}`,
        `Impact energy ${formatQuantity('energy', energy, units)}`,
        `Level ${plotText(r.level_name)} · ${formatQuantity('length', r.height_m, units)}`,
        `Consequence: ${plotText(rungName.get(key) ?? 'not classified')}`,
      ].join('<br>'),
    );
  });

  const marker = (colour: string, symbol: (typeof SYMBOLS)[number] | 'circle-open') => ({
    color: colour,
    size: 9,
    symbol,
    opacity: 0.85,
    line: { color: 'rgba(27,36,48,0.45)', width: 0.75 },
  });
  const data: Data[] = [];
  ordered.forEach((level, rung) => {
    const b = buckets.get(level.id);
    if (!b) return;
    data.push({
      type: 'scatter',
      mode: 'markers',
      name: plotText(level.name),
      ...b,
      hovertemplate: '%{text}<extra></extra>',
      marker: marker(LADDER_COLOURS[level.colour].hex, SYMBOLS[rung % SYMBOLS.length]),
    });
  });
  const stray = buckets.get(UNCLASSIFIED);
  if (stray) {
    data.push({
      type: 'scatter',
      mode: 'markers',
      name: 'Not classified',
      ...stray,
      hovertemplate: '%{text}<extra></extra>',
      marker: { ...marker('rgba(0,0,0,0)', 'circle-open'), line: { color: C.muted, width: 1.5 } },
    });
  }

  const bounds = ordered.filter((l) => l.lower_bound_j > 0);
  const xs = [...[...buckets.values()].flatMap((b) => b.x), ...bounds.map((l) => E(l.lower_bound_j))];
  const lo = Math.log10(Math.min(...xs)) - 0.3;
  const hi = Math.log10(Math.max(...xs)) + 0.3;

  const shapes: Partial<Shape>[] = [
    // Pale bands on alternate levels keep each row's markers together by eye.
    ...strips.flatMap((_, i) =>
      i % 2 === 0
        ? []
        : [{ type: 'rect' as const, xref: 'paper' as const, x0: 0, x1: 1, y0: i - 0.5, y1: i + 0.5, fillcolor: C.rule, opacity: 0.25, line: { width: 0 }, layer: 'below' as const }],
    ),
    ...bounds.map((l) => ({
      type: 'line' as const,
      yref: 'paper' as const,
      x0: E(l.lower_bound_j),
      x1: E(l.lower_bound_j),
      y0: 0,
      y1: 1,
      line: { color: LADDER_COLOURS[l.colour].hex, width: 1.25, dash: 'dash' as const },
    })),
  ];
  // Bounds can sit close on a log scale (49 J and 79 J): alternate rows keep their names apart.
  const annotations: Partial<Annotation>[] = bounds.map((l, i) => ({
    x: Math.log10(E(l.lower_bound_j)),
    y: 1,
    yref: 'paper',
    yshift: i % 2 ? 14 : 0,
    xanchor: 'left',
    yanchor: 'bottom',
    text: plotText(l.name),
    showarrow: false,
    font: { size: 10, color: C.ink },
  }));

  const unit = unitLabel('energy', units);
  const layout: Partial<Layout> = {
    margin: { l: 16, r: 24, t: 44, b: 100 },
    xaxis: {
      type: 'log',
      range: [lo, hi],
      title: { text: `effective impact energy (${unit}, logarithmic scale)`, standoff: 6 },
      gridcolor: C.rule,
      exponentformat: 'none',
      separatethousands: true,
      dtick: 1,
      zeroline: false,
    },
    yaxis: {
      tickmode: 'array',
      tickvals: strips.map((_, i) => i),
      ticktext: strips.map((s) => plotText(s.label)),
      range: [-0.6, strips.length - 0.4],
      showgrid: false,
      zeroline: false,
      fixedrange: true,
      automargin: true,
    },
    shapes,
    annotations,
    hovermode: 'closest',
    hoverlabel: { bgcolor: '#ffffff', bordercolor: C.rule, font: { color: C.ink, size: 12 } },
    legend: { orientation: 'h', xref: 'container', yref: 'container', x: 0.01, y: 0.01, xanchor: 'left', yanchor: 'bottom', font: { size: 11 } },
  };

  return { data, layout, strips: strips.length, plotted: xs.length - bounds.length, withoutResult, atZero };
}
