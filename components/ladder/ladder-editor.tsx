'use client';

import { useEffect, useMemo, useRef, useState } from 'react';
import { useFieldArray, useWatch } from 'react-hook-form';
import { type ConsequenceLevel, LADDER_COLOUR_IDS, LADDER_COLOURS, type LadderColour, type UnitSystem } from '@/lib/domain';
import { FormMessage, SelectField, SubmitButton, TextAreaField, TextField } from '@/components/forms/fields';
import { useActionForm } from '@/components/forms/use-action-form';
import { ladderInOrder } from '@/components/register/ladder';
import { saveLadderAction } from '@/lib/actions/register';
import type { ActionState } from '@/lib/actions/state';
import { DEFAULT_LADDER } from '@/lib/domain/default-ladder';
import { writeNumberText } from '@/lib/units/number-text';
import { formatQuantity } from '@/lib/units';
import { ladderSchema } from '@/lib/validation/consequence-level';

const MIN_LEVELS = 2;
const MAX_LEVELS = 8;

interface RungValues {
  name: string;
  lower_bound_j: string;
  colour: LadderColour;
  guidance: string;
  source: string;
}
interface LadderValues {
  levels: RungValues[];
}

const COLOUR_OPTIONS = LADDER_COLOUR_IDS.map((id) => ({ value: id, label: LADDER_COLOURS[id].label }));

const toRow = (level: Pick<ConsequenceLevel, 'name' | 'lower_bound_j' | 'colour' | 'guidance' | 'source'>): RungValues => ({
  name: level.name,
  lower_bound_j: writeNumberText(level.lower_bound_j),
  colour: level.colour,
  guidance: level.guidance,
  source: level.source,
});

/** What a typed bound is in ft·lbf, for people who think in US units; nothing while the box holds no number. */
function usEquivalent(typed: string | undefined): string | null {
  const text = (typed ?? '').trim().replace(',', '.');
  if (!text) return null;
  const joules = Number(text);
  return Number.isFinite(joules) && joules > 0 ? formatQuantity('energy', joules, 'us') : null;
}

const smallButton =
  'rounded-md border border-paper-rule bg-paper-raised px-2.5 py-1 text-sm font-semibold text-ink hover:bg-paper-sunk ' +
  'disabled:cursor-not-allowed disabled:opacity-40';

/**
 * The whole ladder in one form, saved at once, because the server replaces the ladder and reclassifies every item
 * in one transaction. Rows are shown highest level first, like the ladder itself, while the posted names count
 * from the lowest level (levels.0 is the level that starts at 0 J).
 */
export function LadderEditor({ ladder, units }: { ladder: ConsequenceLevel[]; units: UnitSystem }) {
  const initial = useMemo<LadderValues>(() => ({ levels: ladderInOrder(ladder).map(toRow) }), [ladder]);
  const { form, state, pending, formAction, onSubmit, errorFor, ready } = useActionForm(ladderSchema, saveLadderAction, initial);
  const { control, register, setValue, getValues, trigger } = form;
  const { fields, append, remove, swap, replace } = useFieldArray({ control, name: 'levels' });
  const values = useWatch({ control, name: 'levels' });
  const submitted = form.formState.isSubmitted;
  const [notice, setNotice] = useState<{ text: string; state: ActionState } | null>(null);

  // A field array's rows re-register under their new names only once React has rendered the new order, so bound
  // changes that a move implies wait for that render rather than writing into inputs that still carry old names.
  const boundFixes = useRef<[number, string][]>([]);
  useEffect(() => {
    for (const [index, bound] of boundFixes.current) setValue(`levels.${index}.lower_bound_j`, bound);
    boundFixes.current = [];
    if (getValues('levels.0.lower_bound_j') !== '0') setValue('levels.0.lower_bound_j', '0');
    // A bound is checked against its neighbours, so a new order can make or clear errors in rows nobody touched.
    if (submitted) void trigger('levels');
  }, [fields, setValue, getValues, trigger, submitted]);

  const say = (text: string) => setNotice({ text, state });
  const nameOf = (index: number) => values?.[index]?.name?.trim() || `level ${index + 1}`;

  const move = (from: number, to: number) => {
    // The lowest bound belongs to the position, not the level: whichever level lands at the bottom starts at 0 J,
    // and the one it displaces takes over the bound the newcomer had, so the order stays valid.
    if (from === 0 || to === 0) boundFixes.current = [[0, '0'], [1, getValues('levels.1.lower_bound_j')]];
    const name = nameOf(from);
    swap(from, to);
    say(`Moved “${name}” ${to > from ? 'up' : 'down'} to level ${to + 1} of ${fields.length}.`);
  };

  const removeAt = (index: number) => {
    const name = nameOf(index);
    remove(index);
    say(`Removed “${name}”. ${index === 0 ? 'The level above it is now the lowest and starts at 0 J. ' : ''}Nothing is saved until you save the ladder.`);
  };

  const addOnTop = () => {
    const used = new Set((values ?? []).map((v) => v.colour));
    const colour = LADDER_COLOUR_IDS.find((id) => !used.has(id)) ?? LADDER_COLOUR_IDS[LADDER_COLOUR_IDS.length - 1];
    append({ name: '', lower_bound_j: '', colour, guidance: '', source: '' }, { focusName: `levels.${fields.length}.name` });
    say(`Added level ${fields.length + 1} at the top. Give it a name and a lower bound above the level below it.`);
  };

  const restoreDefault = () => {
    replace(DEFAULT_LADDER.map(toRow));
    say('The default ladder is filled in below. Nothing is saved until you press “Save ladder and reclassify”.');
  };

  const discard = () => {
    form.reset(initial);
    say('Back to the saved ladder.');
  };

  const levelsError = form.formState.errors.levels as { message?: string; root?: { message?: string } } | undefined;
  const listError = levelsError?.root?.message ?? levelsError?.message ?? state.errors?.levels;
  const topDown = fields.map((field, index) => ({ field, index })).reverse();
  const last = fields.length - 1;

  return (
    <form action={formAction} onSubmit={onSubmit} noValidate data-ready={ready || undefined} className="flex flex-col gap-4" aria-label="Edit the consequence ladder">
      <div className="flex flex-wrap items-center gap-2">
        <button type="button" onClick={addOnTop} disabled={fields.length >= MAX_LEVELS} className={smallButton}>
          Add a level at the top
        </button>
        <button type="button" onClick={restoreDefault} className={smallButton}>
          Restore the default ladder
        </button>
        <button type="button" onClick={discard} className={smallButton}>
          Discard changes
        </button>
        <span className="text-xs text-ink-muted">
          {fields.length} of at most {MAX_LEVELS} levels; at least {MIN_LEVELS}.
        </span>
      </div>

      <p role="status" className="text-sm text-ink-soft">
        {notice && notice.state === state ? notice.text : ''}
      </p>
      {listError ? (
        <p role="alert" className="text-sm font-semibold text-flare-700">
          {listError}
        </p>
      ) : null}

      <ol className="flex flex-col gap-3" aria-label="Levels, highest first">
        {topDown.map(({ field, index }) => {
          const colour = LADDER_COLOURS[values?.[index]?.colour ?? field.colour] ?? LADDER_COLOURS.haze;
          const position = index === 0 ? ' (lowest)' : index === last ? ' (highest)' : '';
          const converted = units === 'us' ? usEquivalent(values?.[index]?.lower_bound_j) : null;
          const name = nameOf(index);
          return (
            <li key={field.id}>
              <fieldset className="rounded-md border border-l-8 border-paper-rule bg-paper-raised p-4" style={{ borderLeftColor: colour.hex }}>
                <legend className="float-left text-sm font-bold text-ink">
                  Level {index + 1}
                  {position}
                </legend>
                <div className="flex flex-wrap justify-end gap-2">
                  <button type="button" onClick={() => move(index, index + 1)} disabled={index === last} className={smallButton}>
                    Move up<span className="sr-only"> the ladder: {name}</span>
                  </button>
                  <button type="button" onClick={() => move(index, index - 1)} disabled={index === 0} className={smallButton}>
                    Move down<span className="sr-only"> the ladder: {name}</span>
                  </button>
                  <button
                    type="button"
                    onClick={() => removeAt(index)}
                    disabled={fields.length <= MIN_LEVELS}
                    className={`${smallButton} border-flare-500 text-flare-700 hover:bg-flare-50`}
                  >
                    Remove<span className="sr-only"> {name}</span>
                  </button>
                </div>

                <div className="clear-both mt-3 grid gap-3 sm:grid-cols-2 lg:grid-cols-[2fr_1.2fr_1.2fr]">
                  <TextField label="Name" autoComplete="off" maxLength={60} error={errorFor(`levels.${index}.name`)} {...register(`levels.${index}.name`)} />
                  {index === 0 ? (
                    <TextField
                      label="Lower bound"
                      suffix="J"
                      readOnly
                      className="read-only:bg-paper-sunk"
                      hint="The lowest level always starts at 0 J, so every impact energy has a level."
                      error={errorFor('levels.0.lower_bound_j')}
                      {...register('levels.0.lower_bound_j')}
                    />
                  ) : (
                    <TextField
                      label="Lower bound"
                      suffix="J"
                      inputMode="decimal"
                      autoComplete="off"
                      hint={
                        <>
                          Always in joules, whatever unit system you use; above the level below.
                          {converted ? <span className="num"> Equals {converted}.</span> : null}
                        </>
                      }
                      error={errorFor(`levels.${index}.lower_bound_j`)}
                      {...register(`levels.${index}.lower_bound_j`)}
                    />
                  )}
                  <div className="flex items-start gap-2">
                    <div className="min-w-0 flex-1">
                      <SelectField label="Colour" options={COLOUR_OPTIONS} error={errorFor(`levels.${index}.colour`)} {...register(`levels.${index}.colour`)} />
                    </div>
                    <span
                      aria-hidden
                      className="mt-6 h-10 w-10 shrink-0 rounded-md ring-1 ring-black/10 ring-inset"
                      style={{ backgroundColor: colour.hex }}
                    />
                  </div>
                </div>
                <div className="mt-3 grid gap-3">
                  <TextAreaField
                    label="Guidance"
                    rows={2}
                    maxLength={1000}
                    hint="The controls this level calls for."
                    error={errorFor(`levels.${index}.guidance`)}
                    {...register(`levels.${index}.guidance`)}
                  />
                  <TextField
                    label="Source of the bound"
                    autoComplete="off"
                    maxLength={300}
                    hint="The published test or criterion the bound comes from. It is a test condition, not a safe limit."
                    error={errorFor(`levels.${index}.source`)}
                    {...register(`levels.${index}.source`)}
                  />
                </div>
              </fieldset>
            </li>
          );
        })}
      </ol>

      <FormMessage ok={state.ok} message={state.message} />
      <div className="flex flex-wrap items-center gap-3">
        <SubmitButton pending={pending}>Save ladder and reclassify</SubmitButton>
        <span className="text-xs text-ink-muted">Every register line is reclassified at once, and the change is recorded in the audit log.</span>
      </div>
    </form>
  );
}
