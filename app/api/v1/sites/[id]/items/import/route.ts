import { rolesFor } from '@/lib/auth/policy';
import { siteTags } from '@/db/items';
import { listLevels } from '@/db/levels';
import { apiRoute, badRequest } from '@/lib/http/api';
import { siteOf } from '@/lib/register/api';
import { parseItemsCsv } from '@/lib/register/csv-import';
import { CSV_LIMITS, type CsvProblem } from '@/lib/register/csv-limits';
import { cleanText } from '@/lib/validation/text';
import { importItems } from '@/lib/register/commands';

type Params = { id: string };
const MODES = ['check', 'valid-only', 'all-or-nothing'] as const;
type Mode = (typeof MODES)[number];

const asIssue = (p: CsvProblem) => ({ path: p.line ? `line ${p.line}${p.column ? `.${p.column}` : ''}` : 'file', message: p.message });

/**
 * A CSV of items, as multipart/form-data with `file` and `mode`: `check` reads and reports without writing,
 * `valid-only` imports the rows without problems, `all-or-nothing` imports every row or, if any has a problem,
 * none. Writing is one transaction either way.
 */
export const POST = apiRoute<Params>(rolesFor('register.edit'), async (request, { member, params }) => {
  const site = await siteOf(member, params.id);
  // Refuse an oversized upload before reading it into memory; the multipart wrapping adds a little.
  if (Number(request.headers.get('content-length') ?? 0) > CSV_LIMITS.maxBytes + 64 * 1024) {
    badRequest('file', 'The file is larger than 5 MB: split it and import the parts.');
  }
  let form: FormData;
  try {
    form = await request.formData();
  } catch {
    badRequest('(body)', 'Send the CSV as multipart/form-data with a "file" field.');
  }
  const mode = String(form.get('mode') ?? new URL(request.url).searchParams.get('mode') ?? 'check') as Mode;
  if (!MODES.includes(mode)) badRequest('mode', 'mode must be check, valid-only or all-or-nothing.');
  const file = form.get('file');
  if (!(file instanceof Blob)) badRequest('file', 'Attach the CSV file in the "file" field.');
  if (file.size > CSV_LIMITS.maxBytes) badRequest('file', 'The file is larger than 5 MB: split it and import the parts.');
  // The name goes into the audit log's jsonb, which refuses NUL and lone surrogates, and into every answer.
  const fileName = (file instanceof File ? cleanText(file.name, 200) : '') || 'upload.csv';

  const [levels, existingTags] = await Promise.all([listLevels(member.organisationId, site.id), siteTags(member.organisationId, site.id)]);
  const parsed = parseItemsCsv(await file.text(), { levels, existingTags });
  const summary = {
    mode,
    file_name: fileName,
    columns: parsed.columns,
    total_rows: parsed.total_rows,
    valid_rows: parsed.valid.length,
    invalid_rows: parsed.invalid_lines,
    problems: parsed.problems,
    preview: parsed.preview,
  };
  if (parsed.fatal) return Response.json({ ...summary, imported: 0, errors: parsed.problems.map(asIssue) }, { status: 400 });
  if (mode === 'check') return Response.json({ ...summary, imported: 0 });
  if (parsed.problems.length && mode === 'all-or-nothing') {
    return Response.json({ ...summary, imported: 0, errors: parsed.problems.map(asIssue) }, { status: 422 });
  }
  if (!parsed.valid.length) {
    return Response.json({ ...summary, imported: 0, errors: [{ path: 'file', message: 'No row is valid: nothing to import.' }] }, { status: 422 });
  }
  const imported = await importItems(
    member.organisationId,
    member.userId,
    site.id,
    parsed.valid,
    { file_name: fileName, mode, skipped_rows: parsed.invalid_lines },
  );
  return Response.json({ ...summary, imported });
}, { body: 'multipart' });
