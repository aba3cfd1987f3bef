import { randomInt } from 'node:crypto';
import bcrypt from 'bcryptjs';

export const BCRYPT_COST = 12;

export function hashPassword(plain: string): Promise<string> {
  return bcrypt.hash(plain, BCRYPT_COST);
}

export function verifyPassword(plain: string, hash: string): Promise<boolean> {
  return bcrypt.compare(plain, hash);
}

// Compared against when an e-mail is unknown, so a wrong e-mail costs the same time as a wrong password.
const UNKNOWN_USER_HASH = bcrypt.hashSync('plumbline-no-such-user', BCRYPT_COST);

export function burnPasswordCheck(plain: string): Promise<boolean> {
  return bcrypt.compare(plain, UNKNOWN_USER_HASH);
}

// No 0/O, 1/l/I: the admin reads this aloud or copies it by hand to the new member.
const ALPHABET = 'abcdefghjkmnpqrstuvwxyzABCDEFGHJKLMNPQRSTUVWXYZ23456789';

export function temporaryPassword(length = 14): string {
  let out = '';
  for (let i = 0; i < length; i++) out += ALPHABET[randomInt(ALPHABET.length)];
  return out;
}
