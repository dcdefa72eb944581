import type { FieldPath, FieldValues, UseFormSetError } from 'react-hook-form';
import { ApiError } from './api-client';

/** Field errors from a 422 shown beside their fields, as if the form had found them. */
export function showServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
): void {
  if (!(error instanceof ApiError)) return;
  for (const problem of error.errors)
    setError(problem.path as FieldPath<T>, { message: problem.message });
}
