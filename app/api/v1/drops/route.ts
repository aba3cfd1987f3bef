import { apiRoute, jsonError, readJsonBody } from '@/lib/http/api';
import { DROP_COST_LIMIT, dropCost, overCostMessage } from '@/lib/compute/drop-cost';
import { solveOffThread } from '@/lib/compute/drop-pool';
import { dropCaseSchema } from '@/lib/schemas/drop-case';
import { toFieldIssues, type FieldIssue } from '@/lib/validation/issues';

const MAX_CASES = 100;
/** Far above the largest body the cost limit lets through (100 cases with a few layers each, about 150 KB). */
const MAX_BODY_BYTES = 512 * 1024;

/**
 * One drop case, or an array of at most 100, computed with the physics core on the solver's worker threads.
 * Every member may compute, within DROP_COST_LIMIT per request.
 */
export const POST = apiRoute('any', async (request) => {
  if (Number(request.headers.get('content-length') ?? 0) > MAX_BODY_BYTES) {
    return jsonError(413, [{ path: '(body)', message: `The body is larger than ${MAX_BODY_BYTES / 1024} KB: send fewer cases per request.` }]);
  }
  const body = await readJsonBody(request);
  const batch = Array.isArray(body);
  const cases = batch ? (body as unknown[]) : [body];
  if (batch && (cases.length === 0 || cases.length > MAX_CASES)) {
    return jsonError(400, [{ path: '(body)', message: `An array must hold from 1 to ${MAX_CASES} cases; it has ${cases.length}.` }]);
  }
  const issues: FieldIssue[] = [];
  const parsed = cases.map((c, i) => {
    if (typeof c !== 'object' || c === null || Array.isArray(c)) {
      issues.push({ path: batch ? String(i) : '(body)', message: 'A drop case must be a JSON object.' });
      return null;
    }
    const r = dropCaseSchema.safeParse(c);
    if (!r.success) {
      for (const issue of toFieldIssues(r.error)) issues.push({ path: batch ? `${i}.${issue.path}` : issue.path, message: issue.message });
      return null;
    }
    return r.data;
  });
  if (issues.length) return jsonError(400, issues);
  const valid = parsed.filter((c) => c !== null);
  const cost = valid.reduce((sum, c) => sum + dropCost(c), 0);
  if (cost > DROP_COST_LIMIT) return jsonError(422, [{ path: '(body)', message: overCostMessage(cost) }]);

  const outcome = await solveOffThread({ cases: valid, batch }, cost);
  if (outcome.ok) return new Response(outcome.json, { headers: { 'content-type': 'application/json' } });
  const prefix = batch ? `${outcome.index}.` : '';
  if (outcome.kind === 'input') return jsonError(400, [{ path: prefix + outcome.field, message: outcome.detail }]);
  return jsonError(422, [{ path: batch ? String(outcome.index) : '(body)', message: outcome.message }]);
});
