import 'server-only';
import type { AttemptHistory } from '@/db/sign-in-attempts';

/** Failures per e-mail and address in the window before that pair waits for the window to pass. */
export const MAX_FAILURES = 10;
const WINDOW_MINUTES = 15;
/** Failures per account, from anywhere, before each further try waits: 2^(n-5) s, at most ACCOUNT_BACKOFF_CAP_S. */
export const ACCOUNT_FREE_FAILURES = 5;
export const ACCOUNT_BACKOFF_CAP_S = 5 * 60;
/** Failures per address across all accounts in the window. */
export const MAX_ADDRESS_FAILURES = 30;
/** An address that signed in to the account this recently skips the account's back-off (never the other limits). */
const KNOWN_ADDRESS_DAYS = 30;

export type LimitReason = 'pair' | 'account' | 'address';

export interface Refusal {
  reason: LimitReason;
  retryAfterS: number;
  message: string;
}

/**
 * Seconds an account waits after `failures` failures since its last success, counted from the latest of them:
 * none for the first ACCOUNT_FREE_FAILURES, then 1, 2, 4 … doubling to the cap. Never a lock-out: the owner can
 * always try again after at most the cap, and from an address they have used before, at once.
 */
export function accountBackoffS(failures: number): number {
  if (failures < ACCOUNT_FREE_FAILURES) return 0;
  return Math.min(ACCOUNT_BACKOFF_CAP_S, 2 ** (failures - ACCOUNT_FREE_FAILURES));
}

/** "12 seconds", "4 minutes": whole units, rounded up, so waiting as long as told is always enough. */
export function waitText(seconds: number): string {
  if (seconds < 60) return `${seconds} second${seconds === 1 ? '' : 's'}`;
  const minutes = Math.ceil(seconds / 60);
  return `${minutes} minute${minutes === 1 ? '' : 's'}`;
}

const untilS = (at: number, now: Date) => Math.max(1, Math.ceil((at - now.getTime()) / 1000));

/** The limit that refuses this attempt now, or null when it may go ahead. */
export function refusalFor(history: AttemptHistory, now: Date): Refusal | null {
  const windowMs = WINDOW_MINUTES * 60_000;
  if (history.pair.count >= MAX_FAILURES && history.pair.oldest) {
    // Minutes, as the sign-in form has always said; the header carries the same wait in seconds.
    const retryAfterS = Math.ceil(untilS(new Date(history.pair.oldest).getTime() + windowMs, now) / 60) * 60;
    return { reason: 'pair', retryAfterS, message: `Too many failed sign-ins. Try again in ${waitText(retryAfterS)}.` };
  }
  if (history.address.count >= MAX_ADDRESS_FAILURES && history.address.oldest) {
    const retryAfterS = untilS(new Date(history.address.oldest).getTime() + windowMs, now);
    return { reason: 'address', retryAfterS, message: `Too many failed sign-ins from your network. Try again in ${waitText(retryAfterS)}.` };
  }
  const backoff = accountBackoffS(history.account.count);
  if (backoff > 0 && !history.knownAddress && history.account.last) {
    const freeAt = new Date(history.account.last).getTime() + backoff * 1000;
    if (freeAt > now.getTime()) {
      const retryAfterS = untilS(freeAt, now);
      return { reason: 'account', retryAfterS, message: `Too many failed sign-ins to this account. Try again in ${waitText(retryAfterS)}.` };
    }
  }
  return null;
}

/** Attempts older than the longest look-back (the known-address days, and a day to spare) are of no use. */
export function pruneBefore(now: Date): Date {
  return new Date(now.getTime() - (KNOWN_ADDRESS_DAYS + 1) * 86_400_000);
}

/** The window the limits count over, and how far back a successful sign-in makes an address known. */
export function limitWindows(now: Date): { windowStart: Date; knownSince: Date } {
  return {
    windowStart: new Date(now.getTime() - WINDOW_MINUTES * 60_000),
    knownSince: new Date(now.getTime() - KNOWN_ADDRESS_DAYS * 86_400_000),
  };
}
