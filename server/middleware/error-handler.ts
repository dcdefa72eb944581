import type { NextFunction, Request, Response } from 'express';
import { BaseError, ForeignKeyConstraintError, UniqueConstraintError } from 'sequelize';
import { StorageUnavailable } from '../services/storage/storage';
import { HttpProblem, problemType, problems } from './problem';

interface BodyParserError {
  type?: string;
  status?: number;
  expose?: boolean;
}

/** Renders every error as RFC 9457 problem details; never leaks a stack to the client. */
export function errorHandler(error: unknown, req: Request, res: Response, _next: NextFunction) {
  const problem = toProblem(error);
  // The request log line (pino-http) carries the error; the client gets only the problem.
  if (problem.status >= 500) res.err = error instanceof Error ? error : new Error(String(error));
  res
    .status(problem.status)
    .type('application/problem+json')
    .json({
      type: problemType(problem.status),
      title: problem.title,
      status: problem.status,
      detail: problem.detail ?? problem.title,
      instance: req.originalUrl,
      ...(problem.errors ? { errors: problem.errors } : {}),
    });
}

function toProblem(error: unknown): HttpProblem {
  if (error instanceof HttpProblem) return error;
  if (error instanceof UniqueConstraintError) {
    const errors = error.errors.map((item) => ({
      path: item.path ?? '(root)',
      message: `${item.value ?? 'This value'} is already in use`,
    }));
    return problems.conflict('A record with the same unique value exists.', errors);
  }
  if (error instanceof ForeignKeyConstraintError) {
    return problems.conflict(
      'Other records still refer to this one, or a linked record is missing.',
    );
  }
  const parserError = error as BodyParserError;
  if (parserError?.type === 'entity.parse.failed') return problems.badRequest('Malformed JSON.');
  if (parserError?.type === 'entity.too.large') {
    return new HttpProblem(413, 'Too large', 'The request body is too large.');
  }
  if (parserError?.expose && parserError.status && parserError.status < 500) {
    return new HttpProblem(parserError.status, 'Bad request', String((error as Error).message));
  }
  // The router marks a path it cannot decode (`%E0%A4%A`) as 400 but not exposed.
  if (error instanceof URIError || (parserError?.status ?? 0) === 400) {
    return problems.badRequest('The address could not be read (bad %-encoding).');
  }
  if (error instanceof BaseError) return new HttpProblem(500, 'Database error');
  if (error instanceof StorageUnavailable) {
    return new HttpProblem(
      503,
      'Storage unavailable',
      'The storage of originals did not answer. Try again in a moment; if it lasts, tell your administrator.',
    );
  }
  return new HttpProblem(500, 'Server error', 'Something went wrong on our side.');
}

/** 404 for any /api path no router answered. */
export function apiNotFound(req: Request, _res: Response, next: NextFunction) {
  next(new HttpProblem(404, 'Not found', `No route for ${req.method} ${req.path}.`));
}
