import type { z } from 'zod';

const NUL = /\u0000/;
// A high surrogate not followed by a low one, or a low one not preceded by a high one.
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

/**
 * Why a text cannot be stored, or null. PostgreSQL's text refuses NUL, and its jsonb (the audit log) refuses a lone
 * UTF-16 surrogate, which is also no character at all; both would otherwise fail the write with a 500.
 */
export function textFault(text: string): string | null {
  if (NUL.test(text)) return 'contains a NUL character (U+0000), which cannot be stored: remove it.';
  if (LONE_SURROGATE.test(text)) return 'contains a broken character (a lone UTF-16 surrogate), which cannot be stored: retype it.';
  return null;
}

/** A zod refinement for every text field: `.superRefine(storableText('Notes'))`. */
export function storableText(label: string) {
  return (value: string, ctx: z.RefinementCtx) => {
    const fault = textFault(value);
    if (fault) ctx.addIssue({ code: 'custom', message: `${label} ${fault}` });
  };
}

/** A text that is only shown and logged, never refused (an uploaded file's name): faults replaced, length bounded. */
export function cleanText(text: string, max: number): string {
  const clean = text.replace(/[\u0000-\u001f\u007f]/g, '').replace(new RegExp(LONE_SURROGATE.source, 'g'), '\uFFFD');
  return Array.from(clean).slice(0, max).join('');
}
