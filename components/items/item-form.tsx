'use client';

import { useWatch } from 'react-hook-form';
import { CATEGORY_LABELS, DIMENSION_LABELS, ITEM_CATEGORIES, REGISTER_RULES, SECURING, SECURING_LABELS, SHAPE_LABELS, type UnitSystem } from '@/lib/domain';
import { dimensionsOf, SHAPE_CHOICES, type ShapeChoice } from '@/lib/shape-choice';
import { FormMessage, SelectField, SubmitButton, TextAreaField, TextField } from '@/components/forms/fields';
import { useActionForm } from '@/components/forms/use-action-form';
import { saveItemAction } from '@/lib/actions/register';
import type { ItemValues } from '@/lib/register/form-values';
import { formatQuantity, unitLabel } from '@/lib/units';
import { itemSchema } from '@/lib/validation/item';

const CATEGORY_OPTIONS = ITEM_CATEGORIES.map((c) => ({ value: c, label: CATEGORY_LABELS[c] }));
const SECURING_OPTIONS = SECURING.map((s) => ({ value: s, label: SECURING_LABELS[s] }));
const SHAPE_OPTIONS = SHAPE_CHOICES.map((s) => ({ value: s, label: SHAPE_LABELS[s] }));

export interface LevelChoice {
  id: string;
  name: string;
  floor_height_m: number;
}

/** Adds an item to a site's register (no id) or edits one; either way its fall is computed before it is stored. */
export function ItemForm({
  siteId,
  id,
  initial,
  units,
  levels,
}: {
  siteId: string;
  id?: string;
  initial: ItemValues;
  units: UnitSystem;
  levels: LevelChoice[];
}) {
  const { form, state, pending, formAction, onSubmit, errorFor, ready } = useActionForm(itemSchema(units), saveItemAction, initial);
  const shape = useWatch({ control: form.control, name: 'shape' }) as ShapeChoice;
  const levelId = useWatch({ control: form.control, name: 'level_id' });
  const direct = shape === 'direct';
  const level = levels.find((l) => l.id === levelId);
  const length = unitLabel('length', units);
  const levelOptions = [{ value: '', label: 'Choose a level…' }, ...levels.map((l) => ({ value: l.id, label: `${l.name} (${formatQuantity('length', l.floor_height_m, units)})` }))];

  return (
    <form action={formAction} onSubmit={onSubmit} noValidate data-ready={ready || undefined} className="flex flex-col gap-5" aria-label={id ? 'Item' : 'New item'}>
      {id ? <input type="hidden" name="id" value={id} /> : null}
      <input type="hidden" name="site_id" value={siteId} />
      <input type="hidden" name="units" value={units} />

      <fieldset className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
        <legend className="mb-2 text-base font-bold">What it is</legend>
        <TextField label="Tag" autoComplete="off" hint="Unique in this site, e.g. L3-017." error={errorFor('tag')} {...form.register('tag')} />
        <div className="sm:col-span-2">
          <TextField label="Description" autoComplete="off" error={errorFor('description')} {...form.register('description')} />
        </div>
        <SelectField label="Category" options={CATEGORY_OPTIONS} error={errorFor('category')} {...form.register('category')} />
        <TextField label="Quantity" inputMode="numeric" hint="Identical items at this spot." error={errorFor('quantity')} {...form.register('quantity')} />
        <SelectField label="Securing" options={SECURING_OPTIONS} error={errorFor('securing')} {...form.register('securing')} />
        <TextField label="Last inspection" type="date" error={errorFor('last_inspected')} {...form.register('last_inspected')} />
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
        <legend className="mb-2 text-base font-bold">Where it is</legend>
        <SelectField label="Level" options={levelOptions} error={errorFor('level_id')} {...form.register('level_id')} />
        <TextField
          label="Drop height"
          inputMode="decimal"
          suffix={length}
          hint={
            level
              ? `Above the impact surface. Blank: the level's floor height, ${formatQuantity('length', level.floor_height_m, units)}.`
              : "Above the impact surface. Blank: the level's floor height."
          }
          error={errorFor('height')}
          {...form.register('height')}
        />
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
        <legend className="mb-2 text-base font-bold">Mass and shape</legend>
        <TextField label="Mass" inputMode="decimal" suffix={unitLabel('mass', units)} error={errorFor('mass')} {...form.register('mass')} />
        <div className="sm:col-span-2">
          <SelectField label="Shape" options={SHAPE_OPTIONS} error={errorFor('shape')} {...form.register('shape')} />
        </div>
        {dimensionsOf(shape).map((d) => (
          <TextField
            key={d}
            label={DIMENSION_LABELS[d]}
            inputMode="decimal"
            suffix={length}
            error={errorFor(`dimensions.${d}` as 'tag')}
            {...form.register(`dimensions.${d}` as 'tag')}
          />
        ))}
        {errorFor('dimensions' as 'tag') ? (
          <p role="alert" className="text-sm font-semibold text-flare-700 sm:col-span-2">
            {errorFor('dimensions' as 'tag')}
          </p>
        ) : null}
      </fieldset>

      <details className="rounded-md border border-paper-rule px-3 py-2" open={direct || Boolean(initial.cd || initial.area || initial.volume) || undefined}>
        <summary className="cursor-pointer text-sm font-semibold text-ink-soft">{direct ? 'Coefficients' : 'Expert: override the shape’s coefficients'}</summary>
        <div className="mt-3 grid gap-3 sm:grid-cols-3">
          <TextField label="Drag coefficient C_d" inputMode="decimal" hint={direct ? undefined : 'Blank: from the shape'} error={errorFor('cd')} {...form.register('cd')} />
          <TextField
            label={REGISTER_RULES.area.label}
            inputMode="decimal"
            suffix={unitLabel('area', units)}
            hint={direct ? undefined : 'Blank: from the shape'}
            error={errorFor('area')}
            {...form.register('area')}
          />
          <TextField
            label={REGISTER_RULES.volume.label}
            inputMode="decimal"
            suffix={unitLabel('volume', units)}
            hint={direct ? 'Blank: 0, no buoyancy in water' : 'Blank: from the shape'}
            error={errorFor('volume')}
            {...form.register('volume')}
          />
        </div>
      </details>

      <TextAreaField label="Notes" error={errorFor('notes')} {...form.register('notes')} />
      <FormMessage ok={state.ok} message={state.message} />
      <div>
        <SubmitButton pending={pending}>{id ? 'Save and recompute' : 'Add to the register'}</SubmitButton>
      </div>
    </form>
  );
}
