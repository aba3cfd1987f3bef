import { listLevels } from '@/db/levels';
import { apiRoute } from '@/lib/http/api';
import { siteOf } from '@/lib/register/api';
import { itemsTemplateCsv } from '@/lib/register/csv-write';

type Params = { siteId: string };

/** A template whose example rows use this site's own level names, so it imports as it stands. */
export const GET = apiRoute<Params>('any', async (request, { member, params }) => {
  const site = await siteOf(member, params.siteId);
  const asked = new URL(request.url).searchParams.get('units');
  const units = asked === 'si' || asked === 'us' ? asked : member.unitSystem;
  const levels = await listLevels(member.organisationId, site.id);
  return new Response(itemsTemplateCsv(units, levels.map((l) => l.name)), {
    headers: {
      'content-type': 'text/csv; charset=utf-8',
      'content-disposition': `attachment; filename="plumbline-items-template-${units}.csv"`,
      'cache-control': 'no-store',
    },
  });
});
