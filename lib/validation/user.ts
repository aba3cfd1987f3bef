import { z } from 'zod';
import { UNIT_SYSTEMS } from '@/lib/domain';
import { storableText } from './text';

const email = z
  .string({ error: 'E-mail is required.' })
  .trim()
  .min(1, 'E-mail is required.')
  .max(254, 'E-mail must be at most 254 characters.')
  .superRefine(storableText('E-mail'))
  .pipe(z.email('E-mail must be a valid address, like name@example.com.'));

const displayName = z
  .string({ error: 'Name is required.' })
  .trim()
  .min(1, 'Name is required.')
  .max(120, 'Name must be at most 120 characters.')
  .superRefine(storableText('Name'));

// bcrypt reads at most 72 bytes; a longer password would be silently truncated.
const newPassword = z
  .string({ error: 'Password is required.' })
  .min(10, 'Password must be at least 10 characters.')
  .max(72, 'Password must be at most 72 characters.')
  .superRefine(storableText('Password'));

export const organisationName = z
  .string({ error: 'Organisation name is required.' })
  .trim()
  .min(2, 'Organisation name must be at least 2 characters.')
  .max(120, 'Organisation name must be at most 120 characters.')
  .superRefine(storableText('Organisation name'));

export const signInSchema = z.object({
  email,
  password: z
    .string({ error: 'Password is required.' })
    .min(1, 'Password is required.')
    .max(200, 'Password must be at most 200 characters.')
    .superRefine(storableText('Password')),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const signUpSchema = z.object({
  organisationName,
  displayName,
  email,
  password: newPassword,
});
export type SignUpInput = z.infer<typeof signUpSchema>;

export const profileSchema = z.object({
  displayName,
  unitSystem: z.enum(UNIT_SYSTEMS, { error: 'Unit system must be SI or US customary.' }),
});
export type ProfileInput = z.infer<typeof profileSchema>;

export const passwordChangeSchema = z
  .object({
    currentPassword: z
      .string({ error: 'Current password is required.' })
      .min(1, 'Current password is required.')
      .max(200)
      .superRefine(storableText('Current password')),
    newPassword,
    confirmPassword: z.string({ error: 'Repeat the new password.' }),
  })
  .refine((v) => v.newPassword === v.confirmPassword, {
    path: ['confirmPassword'],
    message: 'The two new passwords differ.',
  });
export type PasswordChangeInput = z.infer<typeof passwordChangeSchema>;

export const userFields = { email, displayName };
