'use client';

import { useState } from 'react';
import type { UnitSystem } from '@/lib/domain';
import type { DropCase, DropResult } from '@/lib/physics';
import { formatNumber, formatQuantity, unitLabel, fromSI, type Quantity } from '@/lib/units';
import { SafetyNote } from '@/components/layout/safety-note';
import { buttonStyles } from '@/components/ui/button';
import { EnergyScale, HeightPlot, PathPlot, SpeedPlot } from './drop-plots';
import { summaryText } from './summary-text';

interface Props {
  result: DropResult;
  dropCase: DropCase;
  units: UnitSystem;
  description: string;
  updating: boolean;
}

function change(value: number, reference: number): string | null {
  if (!(reference > 0)) return null;
  const pct = ((value - reference) / reference) * 100;
  if (Math.abs(pct) < 0.05) return 'drag changes it by less than 0.1 %';
  return `drag ${pct > 0 ? 'adds' : 'removes'} ${formatNumber(Math.abs(pct), 2)} %`;
}

/** Reynolds numbers span many decades; three figures and a power of ten read best. */
function formatReynolds(re: number): string {
  if (re < 1e4) return formatNumber(re, 3);
  const exp = Math.floor(Math.log10(re));
  return `${(re / 10 ** exp).toFixed(2)} × 10^${exp}`;
}

function Readout({ label, quantity, value, units, vacuum, note, testId }: {
  label: string;
  quantity: Quantity;
  value: number;
  units: UnitSystem;
  vacuum?: number;
  note?: string;
  testId: string;
}) {
  return (
    <div className="flex flex-col gap-1 rounded-card border-t-4 border-cord-500 bg-paper-raised p-4 shadow-card">
      <dt className="text-xs font-semibold uppercase tracking-wide text-ink-muted">{label}</dt>
      <dd className="flex items-baseline gap-1.5" data-testid={testId}>
        <span className="num text-3xl font-semibold text-ink">{formatNumber(fromSI(quantity, value, units), 3)}</span>
        <span className="text-sm text-ink-soft">{unitLabel(quantity, units)}</span>
      </dd>
      {vacuum !== undefined ? (
        <dd className="text-xs text-ink-muted">
          Vacuum <span className="num">{formatQuantity(quantity, vacuum, units)}</span>
          {change(value, vacuum) ? ` · ${change(value, vacuum)}` : ''}
        </dd>
      ) : null}
      {note ? <dd className="text-xs text-ink-muted">{note}</dd> : null}
    </div>
  );
}

function Verification({ result, units }: { result: DropResult; units: UnitSystem }) {
  if (!result.closed_form || result.closed_form_rel_deviation === null || !result.verification) {
    return (
      <p className="rounded-md bg-paper-sunk px-3 py-2 text-sm text-ink-soft" data-testid="verification">
        No closed form covers this case (cross-flow, a release speed with drag, or several layers), so the integration
        stands on its own tolerances here.
      </p>
    );
  }
  const passed = result.verification.passed;
  return (
    <p
      data-testid="verification"
      className={`rounded-md px-3 py-2 text-sm ${passed ? 'bg-moss-50 text-moss-700' : 'bg-flare-50 text-flare-700'}`}
    >
      <strong>{passed ? '✓ Checked against the closed form.' : '✗ Integration disagrees with the closed form.'}</strong>{' '}
      Closed form: fall time <span className="num">{formatQuantity('time', result.closed_form.fall_time_s, units, 6)}</span>, impact speed{' '}
      <span className="num">{formatQuantity('speed', result.closed_form.impact_speed_m_s, units, 6)}</span>; relative deviation{' '}
      <span className="num">{result.closed_form_rel_deviation.toExponential(1)}</span> (limit{' '}
      <span className="num">{result.verification.threshold.toExponential(0)}</span>).
    </p>
  );
}

export function DropResults({ result, dropCase, units, description, updating }: Props) {
  const [copied, setCopied] = useState(false);
  const inLiquid = result.effective_impact_energy_j !== result.impact_energy_j;
  const vx0 = dropCase.release?.velocity_m_s?.[0] ?? 0;

  const copy = async () => {
    await navigator.clipboard.writeText(summaryText(result, units, description, window.location.href));
    setCopied(true);
    setTimeout(() => setCopied(false), 2500);
  };

  return (
    <section aria-label="Results" aria-busy={updating || undefined} className={`flex flex-col gap-4 transition-opacity ${updating ? 'opacity-60' : ''}`}>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 className="text-lg font-bold">Results</h2>
        <button
          type="button"
          onClick={copy}
          className={buttonStyles.small}
        >
          {copied ? 'Summary copied' : 'Copy summary'}
        </button>
      </div>
      {result.floats_at ? (
        <p role="status" className="rounded-card bg-cord-50 px-4 py-3 text-cord-700" data-testid="floats">
          <strong>It floats in the {result.floats_at}.</strong> It does not reach the bottom: the values below are those on
          arrival at the surface of the {result.floats_at}, which is where it strikes.
        </p>
      ) : null}
      <dl className="grid gap-3 sm:grid-cols-2">
        <Readout label={result.floats_at ? 'Warning time (to the surface it floats at)' : 'Warning time (fall)'} quantity="time" value={result.fall_time_s} vacuum={result.vacuum.fall_time_s} units={units} testId="fall-time" />
        <Readout
          label="Impact speed"
          quantity="speed"
          value={result.impact_speed_m_s}
          vacuum={result.vacuum.impact_speed_m_s}
          units={units}
          testId="impact-speed"
          note={result.fraction_of_terminal !== null ? `${formatNumber(result.fraction_of_terminal * 100, 3)} % of terminal speed` : undefined}
        />
        <Readout
          label={inLiquid ? 'Effective impact energy' : 'Impact energy'}
          quantity="energy"
          value={result.effective_impact_energy_j}
          vacuum={result.vacuum.impact_energy_j}
          units={units}
          testId="impact-energy"
          note={inLiquid ? `½·m·v² alone: ${formatQuantity('energy', result.impact_energy_j, units)}; with added mass ½·(m + m_a)·v²` : undefined}
        />
        <Readout
          label="Drift (radius from release)"
          quantity="length"
          value={Math.abs(result.drift_m)}
          vacuum={Math.abs(vx0 * result.vacuum.fall_time_s)}
          units={units}
          testId="drift"
        />
      </dl>

      <Verification result={result} units={units} />

      <dl className="grid grid-cols-[auto_1fr] gap-x-6 gap-y-1 rounded-card bg-paper-raised p-4 text-sm shadow-card sm:grid-cols-[auto_1fr_auto_1fr]">
        <dt className="text-ink-muted">Impact momentum</dt>
        <dd className="num">{formatQuantity('momentum', result.impact_momentum_kg_m_s, units)}</dd>
        <dt className="text-ink-muted">Terminal speed</dt>
        <dd className="num">{result.terminal_speed_m_s === null ? 'none (no drag)' : formatQuantity('speed', result.terminal_speed_m_s, units)}</dd>
        <dt className="text-ink-muted">Impact velocity (across, down)</dt>
        <dd className="num">
          {formatQuantity('speed', result.impact_velocity_m_s[0], units)}, {formatQuantity('speed', -result.impact_velocity_m_s[1], units)}
        </dd>
        <dt className="text-ink-muted">Highest point</dt>
        <dd className="num">{result.apex_height_m === null ? 'the release point' : formatQuantity('length', result.apex_height_m, units)}</dd>
        <dt className="text-ink-muted">Reynolds number at impact</dt>
        <dd className="num">{result.reynolds_at_impact === null ? '—' : formatReynolds(result.reynolds_at_impact)}</dd>
        <dt className="text-ink-muted">Drag model</dt>
        <dd>{dropCase.drag_model.replace('_', ' + ')}</dd>
        <dd className="col-span-full text-xs text-ink-muted">{result.reynolds_regime.note}</dd>
        {result.layers.length > 1
          ? result.layers.map((l) => (
              <dd key={l.index} className="col-span-full text-xs text-ink-soft">
                Layer {l.index + 1}, {l.medium}: enters at <span className="num">{formatQuantity('speed', l.entry_speed_m_s ?? NaN, units)}</span> after{' '}
                <span className="num">{formatQuantity('time', l.entry_time_s ?? NaN, units)}</span>; terminal speed{' '}
                <span className="num">{l.terminal_speed_m_s === null ? '—' : formatQuantity('speed', l.terminal_speed_m_s, units)}</span>
              </dd>
            ))
          : null}
      </dl>

      {result.warnings.length ? (
        <ul className="flex flex-col gap-1 rounded-card border-l-4 border-cord-500 bg-cord-50 px-4 py-3 text-sm text-cord-700" aria-label="Notes on this case">
          {result.warnings.map((w) => (
            <li key={w}>{w}</li>
          ))}
        </ul>
      ) : null}

      <SafetyNote />

      <div className="grid gap-3 lg:grid-cols-2">
        <SpeedPlot result={result} dropCase={dropCase} units={units} />
        <HeightPlot result={result} dropCase={dropCase} units={units} />
        <div className="lg:col-span-2">
          <PathPlot result={result} dropCase={dropCase} units={units} />
        </div>
        <div className="lg:col-span-2">
          <EnergyScale result={result} dropCase={dropCase} units={units} />
        </div>
      </div>
      <p className="text-xs text-ink-muted">{result.notice} Model {result.model_version}.</p>
    </section>
  );
}
