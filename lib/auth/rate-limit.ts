import { recentFailures } from '@/db/sign-in-attempts';

export const MAX_FAILURES = 10;
export const WINDOW_MINUTES = 15;

/** Minutes until this e-mail and address may try again, or 0 when they may try now. */
export async function minutesLocked(email: string, address: string, now = new Date()): Promise<number> {
  const since = new Date(now.getTime() - WINDOW_MINUTES * 60_000);
  const { count, oldest } = await recentFailures(email, address, since);
  if (count < MAX_FAILURES || !oldest) return 0;
  const freeAt = new Date(oldest).getTime() + WINDOW_MINUTES * 60_000;
  return Math.max(1, Math.ceil((freeAt - now.getTime()) / 60_000));
}
