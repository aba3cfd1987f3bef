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
      if (outcome.retryAfterMinutes) response.headers.set('Retry-After', String(outcome.retryAfterMinutes * 60));
      return response;
    }
    await startSession(outcome.member.userId, outcome.member.organisationId);
    return Response.json(memberJson(outcome.member));
  } catch (error) {
    return errorResponse(error);
  }
}

export async function DELETE(request: Request): Promise<Response> {
  const refused = refuseCrossSite(request);
  if (refused) return refused;
  await endSession();
  return new Response(null, { status: 204 });
}
