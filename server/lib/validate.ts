import type { z } from 'zod';
import type { ErrorIssue } from '@shared/schemas/errors';
import { HttpError } from './http-error';

function issuesOf(error: z.ZodError): ErrorIssue[] {
  return error.issues.map((issue) => ({
    path: issue.path.map(String).join('.'),
    message: issue.message,
  }));
}

function summarize(where: string, issues: ErrorIssue[]): string {
  const parts = issues.map((i) => (i.path ? `${i.path}: ${i.message}` : i.message));
  return `The ${where} is not valid. ${parts.join(' ')}`;
}

/** Parses request input with a shared schema; bad input becomes 400 VALIDATION_FAILED. */
export function parseInput<S extends z.ZodType>(
  schema: S,
  value: unknown,
  where: 'request body' | 'query' | 'path' = 'request body',
): z.output<S> {
  const result = schema.safeParse(value ?? {});
  if (result.success) return result.data;
  const issues = issuesOf(result.error);
  throw new HttpError(400, 'VALIDATION_FAILED', summarize(where, issues), issues);
}
