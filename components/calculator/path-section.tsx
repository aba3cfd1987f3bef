'use client';

import { SelectField } from '@/components/forms/fields';
import { MODEL_CHOICES, PATHS, type CalculatorValues } from '@/lib/calculator/values';
import { CalcNumber, ChoiceRow, Section, type CalcForm } from './field-helpers';
import { MODEL_LABELS, PATH_LABELS, RELEASE_LABELS } from './labels';

const PATH_OPTIONS = PATHS.map((value) => ({ value, label: PATH_LABELS[value] }));
const MODEL_OPTIONS = MODEL_CHOICES.map((value) => ({ value, label: MODEL_LABELS[value] }));

export function PathSection({ form, values }: { form: CalcForm; values: CalculatorValues }) {
  const path = values.path;
  return (
    <Section title="Medium and path">
      <SelectField label="Falls through" options={PATH_OPTIONS} {...form.register('path')} />
      {path === 'deck_to_sea' ? (
        <div className="grid grid-cols-2 gap-3">
          <CalcNumber form={form} name="airGap" hint="Release point to the water surface" />
          <CalcNumber form={form} name="waterDepth" hint="Surface to the seabed" />
        </div>
      ) : (
        <CalcNumber form={form} name="dropHeight" hint="Release point to the impact surface" />
      )}
      {path === 'air' || path === 'deck_to_sea' ? (
        <div className="grid grid-cols-2 gap-3">
          <CalcNumber form={form} name="altitude" hint="ISA air density at this altitude" />
          <CalcNumber form={form} name="tempOffset" label="ISA temperature offset" hint="Hot day: positive" />
        </div>
      ) : null}
      {path === 'freshwater' ? <CalcNumber form={form} name="waterTemp" /> : null}
      {path === 'custom' ? (
        <div className="grid grid-cols-2 gap-3">
          <CalcNumber form={form} name="density" />
          <CalcNumber form={form} name="viscosity" />
        </div>
      ) : null}
      <div className="grid grid-cols-2 gap-3">
        {path === 'air' || path === 'custom' || path === 'deck_to_sea' ? (
          <CalcNumber form={form} name="wind" hint="Horizontal, steady" />
        ) : null}
        {path === 'seawater' || path === 'freshwater' || path === 'deck_to_sea' ? (
          <CalcNumber form={form} name="current" hint="Horizontal, uniform with depth" />
        ) : null}
      </div>
    </Section>
  );
}

export function ReleaseSection({ form, values }: { form: CalcForm; values: CalculatorValues }) {
  return (
    <Section title="Release and model">
      <ChoiceRow form={form} name="release" legend="How it leaves" options={RELEASE_LABELS} />
      {values.release !== 'rest' ? (
        <div className="grid grid-cols-2 gap-3">
          <CalcNumber form={form} name="releaseSpeed" hint={values.release === 'swing' ? 'Speed of the load at release' : undefined} />
          <CalcNumber form={form} name="releaseAngle" label="Direction above horizontal" hint="Downwind; negative is downwards" />
        </div>
      ) : null}
      <SelectField label="Drag model" options={MODEL_OPTIONS} {...form.register('model')} />
    </Section>
  );
}
