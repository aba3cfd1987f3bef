import { authenticate, endSession, startSession } from '@/lib/auth';
import { apiRoute, errorResponse, jsonError, readJson, refuseCrossSite } from '@/lib/http/api';
import { memberJson } from '@/lib/member-view';
import { signInSchema } from '@/lib/validation/user';

export const GET = apiRoute('any', async (_request, { member }) => Response.json(memberJson(member)));

export async function POST(request: Request): Promise<Response> {
  const refused = refuseCrossSite(request);
  if (refused) return refused;
  try {
    const input = await readJson(request, signInSchema);
    const outcome = await authenticate(input.email, input.password);
    if (!outcome.ok) {
      const response = jsonError(outcome.status, outcome.message);
      if (outcome.retryAfterS) response.headers.set('Retry-After', String(outcome.retryAfterS));
      return response;
    }
    await startSession(outcome.member.userId, outcome.member.organisationId);
    return Response.json(memberJson(outcome.member));
  } catch (error) {
    return errorResponse(error);
  }
}

/** Sign-out: the session row is revoked, so copies of the cookie end too. A page on another site cannot do it. */
export async function DELETE(request: Request): Promise<Response> {
  const refused = refuseCrossSite(request);
  if (refused) return refused;
  try {
    await endSession();
    return new Response(null, { status: 204 });
  } catch (error) {
    return errorResponse(error);
  }
}
