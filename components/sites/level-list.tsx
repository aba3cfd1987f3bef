'use client';

import { useState } from 'react';
import { type Surface, SURFACE_LABELS, type UnitSystem } from '@/lib/domain';
import { ConfirmForm } from '@/components/forms/confirm-form';
import { deleteLevelAction } from '@/lib/actions/register';
import type { LevelValues } from '@/lib/register/form-values';
import { formatQuantity } from '@/lib/units';
import { LevelForm } from './level-form';

export interface LevelEntry {
  id: string;
  name: string;
  floor_height_m: number;
  surface: Surface;
  water_depth_m: number | null;
  line_count: number;
  /** The level as its edit form shows it, in the user's units. */
  values: LevelValues;
}

function LevelRowView({ siteId, level, units, canEdit }: { siteId: string; level: LevelEntry; units: UnitSystem; canEdit: boolean }) {
  const [editing, setEditing] = useState(false);
  return (
    <li className="border-t border-paper-rule py-3 first:border-t-0">
      <div className="flex flex-wrap items-baseline gap-x-4 gap-y-1">
        <span className="min-w-32 font-semibold">{level.name}</span>
        <span className="num text-sm">{formatQuantity('length', level.floor_height_m, units)}</span>
        <span className="text-sm text-ink-soft">
          over {SURFACE_LABELS[level.surface].toLowerCase()}
          {level.surface === 'water' && level.water_depth_m !== null ? (
            <>
              {' '}
              (<span className="num">{formatQuantity('length', level.water_depth_m, units)}</span> deep)
            </>
          ) : null}
        </span>
        <span className="text-sm text-ink-muted">
          {level.line_count} register line{level.line_count === 1 ? '' : 's'}
        </span>
        {canEdit ? (
          <span className="ml-auto flex gap-2">
            <button
              type="button"
              onClick={() => setEditing((e) => !e)}
              aria-expanded={editing}
              className="rounded-md border border-paper-rule px-3 py-1 text-sm font-semibold hover:bg-paper-sunk"
            >
              {editing ? 'Close' : 'Edit'}
              <span className="sr-only"> level {level.name}</span>
            </button>
            <ConfirmForm
              action={deleteLevelAction}
              fields={{ id: level.id, site_id: siteId }}
              question={`Delete the level ${level.name}?`}
              small
              disabledWhy={level.line_count > 0 ? 'Move or delete its items first' : undefined}
            >
              Delete<span className="sr-only"> level {level.name}</span>
            </ConfirmForm>
          </span>
        ) : null}
      </div>
      {editing ? (
        <div className="mt-3 rounded-md bg-paper p-3">
          <LevelForm siteId={siteId} id={level.id} initial={level.values} units={units} />
        </div>
      ) : null}
    </li>
  );
}

export function LevelList({ siteId, levels, units, canEdit }: { siteId: string; levels: LevelEntry[]; units: UnitSystem; canEdit: boolean }) {
  if (!levels.length) {
    return <p className="text-sm text-ink-muted">No levels yet.{canEdit ? ' Add the first one below: items are registered against a level.' : ''}</p>;
  }
  return (
    <ul aria-label="Levels" className="flex flex-col">
      {levels.map((level) => (
        <LevelRowView key={`${level.id}-${level.values.floor_height}-${level.values.name}`} siteId={siteId} level={level} units={units} canEdit={canEdit} />
      ))}
    </ul>
  );
}
