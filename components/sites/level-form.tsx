'use client';

import { useEffect } from 'react';
import { useWatch } from 'react-hook-form';
import type { UnitSystem } from '@/lib/domain';
import { FormMessage, SelectField, SubmitButton, TextField } from '@/components/forms/fields';
import { useActionForm } from '@/components/forms/use-action-form';
import { saveLevelAction } from '@/lib/actions/register';
import type { LevelValues } from '@/lib/register/form-values';
import { unitLabel } from '@/lib/units';
import { levelSchema } from '@/lib/validation/level';
import { SURFACE_OPTIONS } from './options';

/** Adds a level (no id) or edits one; a changed height or surface recomputes the level's items. */
export function LevelForm({ siteId, id, initial, units, onDone }: { siteId: string; id?: string; initial: LevelValues; units: UnitSystem; onDone?: () => void }) {
  const { form, state, pending, formAction, onSubmit, errorFor, ready } = useActionForm(levelSchema(units), saveLevelAction, initial);
  const surface = useWatch({ control: form.control, name: 'surface' });
  const { reset } = form;
  useEffect(() => {
    if (state.ok && !id) reset(initial);
    if (state.ok && onDone) onDone();
  }, [state, id, reset, initial, onDone]);
  const length = unitLabel('length', units);
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate data-ready={ready || undefined} className="flex flex-col gap-3" aria-label={id ? `Edit level ${initial.name}` : 'New level'}>
      {id ? <input type="hidden" name="id" value={id} /> : null}
      <input type="hidden" name="site_id" value={siteId} />
      <input type="hidden" name="units" value={units} />
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        <TextField label="Level name" autoComplete="off" error={errorFor('name')} {...form.register('name')} />
        <TextField
          label="Floor height"
          inputMode="decimal"
          suffix={length}
          hint="Above the surface an object would hit."
          error={errorFor('floor_height')}
          {...form.register('floor_height')}
        />
        <SelectField label="What is below" options={SURFACE_OPTIONS} error={errorFor('surface')} {...form.register('surface')} />
        {surface === 'water' ? (
          <TextField label="Water depth" inputMode="decimal" suffix={length} error={errorFor('water_depth')} {...form.register('water_depth')} />
        ) : (
          <input type="hidden" {...form.register('water_depth')} />
        )}
      </div>
      <TextField label="Notes" autoComplete="off" error={errorFor('notes')} {...form.register('notes')} />
      <FormMessage ok={state.ok} message={state.message} />
      <div>
        <SubmitButton pending={pending} tone={id ? 'quiet' : 'primary'}>
          {id ? 'Save level' : 'Add level'}
        </SubmitButton>
      </div>
    </form>
  );
}
