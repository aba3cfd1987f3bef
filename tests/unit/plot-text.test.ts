import { describe, expect, it } from 'vitest';
import type { ConsequenceLevel, RegisterViewRow } from '@/lib/domain';
import { buildEnergyFigure } from '@/components/register/energy-figure';
import { plotText } from '@/lib/plot-text';

// The probe's payload (issue 9, defect 12) and the other tags Plotly's text renderer interprets (plotly.js
// src/lib/svg_text_utils.js: a, b, i, em, sup, sub, span with style, br).
const HOSTILE = [
  '<a href="https://example.invalid/x">Linked</a>',
  '<span style="font-size:80px">big</span>',
  '<b>bold</b><br>',
  'Tom & Jerry &lt;a&gt;',
];
// Markup the figure adds of its own around member text.
const OWN_MARKUP = /<\/?b>|<br>|<extra><\/extra>/g;

function strings(value: unknown, out: string[] = []): string[] {
  if (typeof value === 'string') out.push(value);
  else if (Array.isArray(value)) value.forEach((v) => strings(v, out));
  else if (value && typeof value === 'object') Object.values(value).forEach((v) => strings(v, out));
  return out;
}

describe('plotText', () => {
  it('turns every character Plotly reads as markup into an entity, and nothing else', () => {
    expect(plotText('<a href="x">y</a> & z')).toBe('&lt;a href="x"&gt;y&lt;/a&gt; &amp; z');
    expect(plotText('Roof · 22 m — ok')).toBe('Roof · 22 m — ok');
  });
});

describe('the energy plot', () => {
  const levelIds = ['9a1b7c2d-0000-4000-8000-000000000001', '9a1b7c2d-0000-4000-8000-000000000002'];
  const ladder: ConsequenceLevel[] = HOSTILE.map((name, i) => ({
    id: `c${i}`,
    rank: i + 1,
    name,
    lower_bound_j: i === 0 ? 0 : 10 ** i,
    colour: 'haze',
    guidance: '',
    source: '',
  }));
  const rows: RegisterViewRow[] = HOSTILE.map((text, i) => ({
    id: `r${i}`,
    tag: text,
    description: text,
    category: 'hand_tool',
    quantity: 2,
    mass_kg: 1,
    shape: 'sphere',
    // The last row sits on a level the page did not pass, whose name is drawn from the row itself.
    level_id: i === HOSTILE.length - 1 ? 'stray' : levelIds[i % 2],
    level_name: text,
    height_m: 10,
    height_overridden: false,
    securing: 'unsecured',
    last_inspected: null,
    fall_time_s: 1,
    impact_speed_m_s: 10,
    impact_energy_j: 5 * 10 ** i,
    effective_energy_j: 5 * 10 ** i,
    drift_m: 0,
    sinks: null,
    consequence_level_id: i === 0 ? 'gone' : `c${i}`,
    computed_at: null,
    compute_error: null,
  }));
  const figure = buildEnergyFigure({ rows, ladder, levels: HOSTILE.slice(0, 2).map((name, i) => ({ id: levelIds[i], name, floor_height_m: 10 * i })), units: 'si' });

  it('draws no tag a member wrote, anywhere in its traces or layout', () => {
    const all = strings([figure.data, figure.layout]);
    expect(all.length).toBeGreaterThan(20);
    for (const s of all) expect(s.replace(OWN_MARKUP, '')).not.toMatch(/</);
  });

  it('shows each name as typed once Plotly turns the entities back', () => {
    const shown = (s: string) => s.replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&amp;/g, '&');
    const legend = figure.data.map((trace) => shown(String(trace.name)));
    expect(legend).toEqual([...HOSTILE.slice(1), 'Not classified']);
    expect(figure.layout.annotations!.map((a) => shown(String(a.text)))).toEqual(HOSTILE.slice(1));
  });
});
