import type { NextFunction, Request, Response } from 'express';
import type { z } from 'zod';
import { problems, type FieldError } from './problem';

type Part = 'body' | 'query' | 'params';

/** zod issues as `{ path, message }`, the path dotted ("processing.5.minutes"). */
export function fieldErrors(error: z.ZodError): FieldError[] {
  return error.issues.map((issue) => ({
    path: issue.path.map(String).join('.') || '(root)',
    message: issue.message,
  }));
}

/**
 * The one validation path: parses a request part with a shared schema, puts the parsed
 * value on `res.locals[part]`, or answers 422 with every failing field.
 */
export function validate(schema: z.ZodType, part: Part = 'body') {
  return (req: Request, res: Response, next: NextFunction) => {
    const result = schema.safeParse(req[part] ?? {});
    if (!result.success) return next(problems.invalid(fieldErrors(result.error)));
    res.locals[part] = result.data;
    next();
  };
}

/** The parsed value that `validate()` left for the handler. */
export function parsed<T>(res: Response, part: Part = 'body'): T {
  return res.locals[part] as T;
}
