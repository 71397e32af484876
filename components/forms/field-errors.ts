import type { ZodError } from 'zod';

/** Field path → first message, the same shape the API sends in `details.fields`. */
export function fieldMessages(error: ZodError): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join('.') : '_';
    if (!(key in out)) out[key] = issue.message;
  }
  return out;
}
