import type { UnitSystem } from '@/lib/domain';
import type { DropResult } from '@/lib/physics';
import { formatQuantity } from '@/lib/units';

/** The plain-text summary the copy button puts on the clipboard, for a message or a permit. */
export function summaryText(result: DropResult, units: UnitSystem, description: string, link: string): string {
  const q = (k: Parameters<typeof formatQuantity>[0], v: number) => formatQuantity(k, v, units);
  const lines = [
    `Plumbline drop estimate: ${description}`,
    `Fall time (warning): ${q('time', result.fall_time_s)} (vacuum ${q('time', result.vacuum.fall_time_s)})`,
    `Impact speed: ${q('speed', result.impact_speed_m_s)}`,
    `Impact energy: ${q('energy', result.impact_energy_j)} (vacuum m·g·h ${q('energy', result.vacuum.impact_energy_j)})`,
  ];
  if (result.effective_impact_energy_j !== result.impact_energy_j) {
    lines.push(`Effective impact energy with added mass: ${q('energy', result.effective_impact_energy_j)}`);
  }
  lines.push(`Drift from the release point: ${q('length', Math.abs(result.drift_m))}`);
  lines.push(`Impact momentum: ${q('momentum', result.impact_momentum_kg_m_s)}`);
  if (result.verification) {
    lines.push(
      `Closed-form check: deviation ${result.closed_form_rel_deviation?.toExponential(1)} (${result.verification.passed ? 'within' : 'OUTSIDE'} ${result.verification.threshold})`,
    );
  }
  for (const w of result.warnings) lines.push(`Note: ${w}`);
  lines.push(
    'Planning estimate only: objects bounce, deflect, break up and tumble. Exclusion zones, tethering and protection follow local codes, site rules and a competent person’s assessment.',
  );
  lines.push(link);
  return lines.join('\n');
}
