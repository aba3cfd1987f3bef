'use client';

import { useMemo } from 'react';
import type { ConsequenceLevel, UnitSystem } from '@/lib/domain';
import { EnergyByLevelPlot } from '@/components/register/energy-by-level-plot';
import { RegisterTable } from '@/components/register/register-table';
import { unpackRegister, type PackedRegister } from '@/lib/register/model';

/** The plot and the table share one packed copy of the rows: a site of thousands of items crosses the wire once. */
export function SiteRegisterView({ packed, ladder, units, canEdit }: { packed: PackedRegister; ladder: ConsequenceLevel[]; units: UnitSystem; canEdit: boolean }) {
  const rows = useMemo(() => unpackRegister(packed), [packed]);
  return (
    <>
      {rows.length ? <EnergyByLevelPlot rows={rows} ladder={ladder} levels={packed.levels} units={units} /> : null}
      <RegisterTable rows={rows} ladder={ladder} levels={packed.levels} units={units} canEdit={canEdit} />
    </>
  );
}
