import { CATEGORY_LABELS, SECURING_LABELS, SHAPE_LABELS, type UnitSystem } from '@/lib/domain';
import type { ShapeChoice } from '@/lib/shape-choice';
import type { ItemDetail } from '@/db/items';
import { formatQuantity } from '@/lib/units';

/** The item's inputs for those who may read but not change them. */
export function ItemFacts({ item, units }: { item: ItemDetail; units: UnitSystem }) {
  const dims = Object.entries(item.dimensions_m)
    .map(([k, v]) => `${k} ${formatQuantity('length', v, units)}`)
    .join(', ');
  const rows: [string, string][] = [
    ['Category', CATEGORY_LABELS[item.category]],
    ['Quantity', String(item.quantity)],
    ['Mass', formatQuantity('mass', item.mass_kg, units)],
    ['Shape', `${SHAPE_LABELS[item.shape as ShapeChoice] ?? item.shape}${dims ? ` (${dims})` : ''}`],
    ['Level', `${item.level_name} (${formatQuantity('length', item.floor_height_m, units)})`],
    ['Drop height', item.height_m === null ? `Level floor, ${formatQuantity('length', item.floor_height_m, units)}` : formatQuantity('length', item.height_m, units)],
    ['Securing', SECURING_LABELS[item.securing]],
    ['Last inspection', item.last_inspected ?? '—'],
  ];
  if (item.cd !== null) rows.push(['Drag coefficient C_d', String(item.cd)]);
  if (item.area_m2 !== null) rows.push(['Reference area', formatQuantity('area', item.area_m2, units)]);
  if (item.volume_m3 !== null) rows.push(['Volume', formatQuantity('volume', item.volume_m3, units)]);
  if (item.notes) rows.push(['Notes', item.notes]);
  return (
    <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[max-content_1fr]">
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="font-semibold text-ink-soft">{k}</dt>
          <dd>{v}</dd>
        </div>
      ))}
    </dl>
  );
}
