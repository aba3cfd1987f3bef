'use client';

import { useWatch } from 'react-hook-form';
import type { UnitSystem } from '@/lib/domain';
import { FormMessage, SelectField, SubmitButton, TextAreaField, TextField } from '@/components/forms/fields';
import { useActionForm } from '@/components/forms/use-action-form';
import { saveSiteAction } from '@/lib/actions/register';
import type { SiteValues } from '@/lib/register/form-values';
import { unitLabel } from '@/lib/units';
import { siteSchema } from '@/lib/validation/site';
import { KIND_OPTIONS, SURFACE_OPTIONS } from './options';

/** Creates a site (no id) or edits one; a changed wind, current or altitude recomputes the site's items. */
export function SiteForm({ id, initial, units }: { id?: string; initial: SiteValues; units: UnitSystem }) {
  const { form, state, pending, formAction, onSubmit, errorFor, ready } = useActionForm(
    siteSchema(units),
    saveSiteAction,
    initial,
  );
  const surface = useWatch({ control: form.control, name: 'surface' });
  const length = unitLabel('length', units);
  const speed = unitLabel('speed', units);
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate data-ready={ready || undefined} className="flex flex-col gap-4" aria-label={id ? 'Site details' : 'New site'}>
      {id ? <input type="hidden" name="id" value={id} /> : null}
      <input type="hidden" name="units" value={units} />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Site name" autoComplete="off" error={errorFor('name')} {...form.register('name')} />
        <SelectField label="Kind" options={KIND_OPTIONS} error={errorFor('kind')} {...form.register('kind')} />
        <TextField label="Location" hint="Address, grid reference or field and platform name." error={errorFor('location')} {...form.register('location')} />
        <TextField
          label="Design wind speed"
          inputMode="decimal"
          suffix={speed}
          hint="Every item's drift is computed at this wind; use the site's working limit or design value."
          error={errorFor('design_wind')}
          {...form.register('design_wind')}
        />
        <SelectField
          label="Usually below"
          hint="The default for new levels; each level says what is below it."
          options={SURFACE_OPTIONS}
          error={errorFor('surface')}
          {...form.register('surface')}
        />
        <TextField label="Site altitude" inputMode="decimal" suffix={length} hint="Sets the ISA air density." error={errorFor('altitude')} {...form.register('altitude')} />
        {surface === 'water' ? (
          <>
            <TextField label="Water depth" inputMode="decimal" suffix={length} hint="Default seabed depth for levels over the sea." error={errorFor('water_depth')} {...form.register('water_depth')} />
            <TextField label="Current" inputMode="decimal" suffix={speed} hint="Carries a sinking object sideways." error={errorFor('current')} {...form.register('current')} />
          </>
        ) : (
          <>
            <input type="hidden" {...form.register('water_depth')} />
            <input type="hidden" {...form.register('current')} />
          </>
        )}
      </div>
      <TextAreaField label="Notes" error={errorFor('notes')} {...form.register('notes')} />
      <FormMessage ok={state.ok} message={state.message} />
      <div>
        <SubmitButton pending={pending}>{id ? 'Save site' : 'Create site'}</SubmitButton>
      </div>
    </form>
  );
}
