'use client';

import { EnergyByLevelPlot } from '@/components/register/energy-by-level-plot';
import { RegisterTable } from '@/components/register/register-table';
import type { UnitSystem } from '@/db/types';
import type { ConsequenceLevel, RegisterViewRow } from '@/lib/register/model';

/** The plot and the table share one copy of the rows: a site of thousands of items crosses the wire once. */
export function SiteRegisterView({
  rows,
  ladder,
  levels,
  units,
  canEdit,
}: {
  rows: RegisterViewRow[];
  ladder: ConsequenceLevel[];
  levels: { id: string; name: string; floor_height_m: number }[];
  units: UnitSystem;
  canEdit: boolean;
}) {
  return (
    <>
      {rows.length ? <EnergyByLevelPlot rows={rows} ladder={ladder} levels={levels} units={units} /> : null}
      <RegisterTable rows={rows} ladder={ladder} levels={levels} units={units} canEdit={canEdit} />
    </>
  );
}
