import { listLadder } from '@/db/consequence-levels';
import { listRegisterForExport } from '@/db/items';
import { apiRoute } from '@/lib/http/api';
import { siteOf } from '@/lib/register/api';
import { registerCsv } from '@/lib/register/csv-write';

type Params = { id: string };

/** The register with its stored results, in the unit system asked for (`?units=si|us`) or the member's own. */
export const GET = apiRoute<Params>('any', async (request, { member, params }) => {
  const site = await siteOf(member, params.id);
  const asked = new URL(request.url).searchParams.get('units');
  const units = asked === 'si' || asked === 'us' ? asked : member.unitSystem;
  const [rows, ladder] = await Promise.all([listRegisterForExport(member.organisationId, site.id), listLadder(member.organisationId)]);
  const slug = site.name.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'site';
  return new Response(registerCsv(rows, { units, ladder, siteName: site.name }), {
    headers: {
      'content-type': 'text/csv; charset=utf-8',
      'content-disposition': `attachment; filename="${slug}-register-${units}.csv"`,
      'cache-control': 'no-store',
    },
  });
});
