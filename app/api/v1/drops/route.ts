import { apiRoute, jsonError, readJsonBody } from '@/lib/http/api';
import { PhysicsInputError, PhysicsSolveError, simulateDrop } from '@/lib/physics';
import { dropCaseSchema } from '@/lib/schemas/drop-case';
import { toFieldIssues, type FieldIssue } from '@/lib/validation/issues';

const MAX_CASES = 100;

/** One drop case, or an array of at most 100, computed with the physics core. Every member may compute. */
export const POST = apiRoute('any', async (request) => {
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

  const results = [];
  for (const [i, c] of parsed.entries()) {
    try {
      results.push(simulateDrop(c!));
    } catch (error) {
      const prefix = batch ? `${i}.` : '';
      if (error instanceof PhysicsInputError) return jsonError(400, [{ path: prefix + error.field, message: error.detail }]);
      if (error instanceof PhysicsSolveError) return jsonError(422, [{ path: batch ? String(i) : '(body)', message: error.message }]);
      throw error;
    }
  }
  return Response.json(batch ? results : results[0]);
});
