import type { z } from 'zod';

/** The first validation message of a failed parse, for a command's error. */
export function firstIssue(error: z.ZodError): string {
  return error.issues[0]?.message ?? 'invalid value';
}
