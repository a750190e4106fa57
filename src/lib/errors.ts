import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from './api-client';

/** Puts a server validation error on the matching form fields; returns the message for the rest. */
export function applyServerErrors<T extends FieldValues>(err: unknown, setError: UseFormSetError<T>, fields: readonly string[]): string {
  if (!(err instanceof ApiError)) return 'Something went wrong. Try again.';
  for (const issue of err.issues) {
    if (fields.includes(issue.path)) setError(issue.path as Path<T>, { message: issue.message });
  }
  return err.message;
}

export function messageOf(err: unknown): string {
  return err instanceof Error ? err.message : 'Something went wrong. Try again.';
}
