'use client';

import { DIMENSION_LABELS, SHAPE_LABELS } from '@/lib/domain';
import { dimensionsOf, SHAPE_CHOICES } from '@/lib/shape-choice';
import { SelectField } from '@/components/forms/fields';
import type { CalculatorValues } from '@/lib/calculator/values';
import { MATERIALS, material } from '@/lib/materials';
import type { ResolvedObject } from '@/lib/physics';
import { formatQuantity } from '@/lib/units';
import { CalcNumber, ChoiceRow, Section, type CalcForm } from './field-helpers';

const SHAPE_OPTIONS = SHAPE_CHOICES.map((value) => ({ value, label: SHAPE_LABELS[value] }));
const MATERIAL_OPTIONS = MATERIALS.map((m) => ({ value: m.id, label: `${m.label} (${m.density_kg_m3} kg/m³)` }));

interface Props {
  form: CalcForm;
  values: CalculatorValues;
  /** Mass, area, volume and C_d as the server resolved them for the last computed case; null until there is one. */
  object: ResolvedObject | null;
}

export function ObjectSection({ form, values, object }: Props) {
  const units = values.units;
  const dims = dimensionsOf(values.shape);
  const p = object ? { object, mass: object.mass_kg } : null;
  const direct = values.shape === 'direct';
  const mat = material(values.material);
  const shapeError = form.formState.errors.shape?.message;

  return (
    <Section title="Object">
      <SelectField label="Shape" options={SHAPE_OPTIONS} error={shapeError} {...form.register('shape')} />
      {dims.length ? (
        <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
          {dims.map((d) => (
            <CalcNumber key={d} form={form} name={d} label={DIMENSION_LABELS[d]} />
          ))}
        </div>
      ) : null}

      {!direct ? <ChoiceRow form={form} name="massSource" legend="Mass from" options={{ typed: 'Mass known', material: 'From material and size' }} /> : null}
      {direct || values.massSource === 'typed' ? (
        <CalcNumber form={form} name="mass" />
      ) : (
        <SelectField label="Material" options={MATERIAL_OPTIONS} hint={mat.source} {...form.register('material')} />
      )}

      {p ? (
        <dl className="grid grid-cols-2 gap-x-4 gap-y-1 rounded-md bg-paper-sunk px-3 py-2 text-sm" aria-label="Object properties">
          <dt className="text-ink-muted">Mass</dt>
          <dd className="num text-right">{formatQuantity('mass', p.mass, units)}</dd>
          <dt className="text-ink-muted">Reference area</dt>
          <dd className="num text-right">{p.object.area_m2 === null ? '—' : formatQuantity('area', p.object.area_m2, units)}</dd>
          <dt className="text-ink-muted">Volume</dt>
          <dd className="num text-right">{formatQuantity('volume', p.object.volume_m3, units)}</dd>
          <dt className="text-ink-muted">Drag coefficient C_d</dt>
          <dd className="num text-right">
            {p.object.cd === null ? '—' : p.object.cd.toFixed(2)}
            {p.object.shape && !p.object.explicit.cd ? (
              <span className="text-ink-muted">
                {' '}
                (range {p.object.shape.cd_range[0]}–{p.object.shape.cd_range[1]})
              </span>
            ) : null}
          </dd>
          {p.object.shape ? (
            <dd className="col-span-2 text-xs text-ink-muted">
              <details>
                <summary className="cursor-pointer">Where these values come from</summary>
                <ul className="mt-1 list-disc pl-4">
                  {p.object.shape.sources.map((src) => (
                    <li key={src}>{src}</li>
                  ))}
                </ul>
              </details>
            </dd>
          ) : null}
        </dl>
      ) : null}

      <details className="group rounded-md border border-paper-rule px-3 py-2" open={direct || undefined}>
        <summary className="cursor-pointer text-sm font-semibold text-ink-soft">
          {direct ? 'Coefficients' : 'Expert: override the shape’s coefficients'}
        </summary>
        <div className="mt-3 grid grid-cols-2 gap-3">
          <CalcNumber form={form} name="cd" label="Drag coefficient C_d" hint={direct ? undefined : 'Blank: from the shape'} />
          <CalcNumber form={form} name="area" hint={direct ? undefined : 'Blank: from the shape'} />
          <CalcNumber form={form} name="volume" hint={direct ? undefined : 'Blank: from the shape'} />
          <CalcNumber form={form} name="addedMass" hint="Liquids only. Blank: from the shape" />
          <CalcNumber form={form} name="linearCoeff" label="Linear drag b" hint="Blank: Stokes’ 3πμd for a sphere" />
        </div>
      </details>
    </Section>
  );
}
