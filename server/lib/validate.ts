import type { z } from 'zod';
import type { ErrorIssue } from '@shared/schemas/errors';
import { HttpError } from './http-error';

const joinPath = (path: readonly PropertyKey[]) => path.map(String).join('.');

/** A field the schema does not know is named on its own path, one issue per field, so a typo is never dropped. */
function issuesOf(error: z.ZodError): ErrorIssue[] {
  return error.issues.flatMap((issue) =>
    issue.code === 'unrecognized_keys'
      ? issue.keys.map((key) => ({ path: joinPath([...issue.path, key]), message: `Unknown field "${key}".` }))
      : [{ path: joinPath(issue.path), message: issue.message }],
  );
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
