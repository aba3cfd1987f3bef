'use client';

import { z } from 'zod';

// zod compiles object parsers with Function() when it may; to find out, it tries once, and under the page's
// Content-Security-Policy (no 'unsafe-eval') that try is a reported violation. Jitless parsing is the same parsing.
z.config({ jitless: true });

/** Rendered once by the root layout so the setting above runs in the browser before any form parses. */
export function ZodJitless() {
  return null;
}
