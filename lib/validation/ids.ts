import { z } from 'zod';
import { UUID_PATTERN } from '@/lib/domain';

/** A row id in a form or JSON body, with the one message the field shows for anything else. */
export function uuidField(message: string) {
  return z.string({ error: message }).regex(UUID_PATTERN, message);
}
