import 'server-only';
import { randomInt } from 'node:crypto';
import { runHash } from './hash-pool';

export const BCRYPT_COST = 12;

/** On the hashing pool (lib/auth/hash-pool.ts); throws UnavailableError when it is full. */
export function hashPassword(plain: string): Promise<string> {
  return runHash<string>({ op: 'hash', plain, cost: BCRYPT_COST });
}

export function verifyPassword(plain: string, hash: string): Promise<boolean> {
  return runHash<boolean>({ op: 'compare', plain, hash });
}

/**
 * Compared against when an e-mail is unknown, so a wrong e-mail costs the same time as a wrong password. A fixed
 * cost-12 hash of a random string no one kept: computing one at start-up would block the event loop for a quarter
 * of a second.
 */
export const UNKNOWN_USER_HASH = '$2b$12$33OgqnRjCiRuEfOxiYGBAet88lGRUioyvX9JzShh5V7RWCbzvE5FK';

export function burnPasswordCheck(plain: string): Promise<boolean> {
  return verifyPassword(plain, UNKNOWN_USER_HASH);
}

// No 0/O, 1/l/I: the admin reads this aloud or copies it by hand to the new member.
const ALPHABET = 'abcdefghjkmnpqrstuvwxyzABCDEFGHJKLMNPQRSTUVWXYZ23456789';

export function temporaryPassword(length = 14): string {
  let out = '';
  for (let i = 0; i < length; i++) out += ALPHABET[randomInt(ALPHABET.length)];
  return out;
}
