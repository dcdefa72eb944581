/** RFC 9457 problem details, thrown anywhere and rendered by the error handler. */
export interface FieldError {
  path: string;
  message: string;
}

export class HttpProblem extends Error {
  constructor(
    readonly status: number,
    readonly title: string,
    readonly detail?: string,
    readonly errors?: FieldError[],
  ) {
    super(detail ?? title);
  }
}

export const problems = {
  badRequest: (detail: string) => new HttpProblem(400, 'Bad request', detail),
  unauthorized: () => new HttpProblem(401, 'Not signed in', 'Sign in to continue.'),
  forbidden: (detail = 'Your role does not allow this.') =>
    new HttpProblem(403, 'Forbidden', detail),
  notFound: (what = 'The record') => new HttpProblem(404, 'Not found', `${what} does not exist.`),
  conflict: (detail: string, errors?: FieldError[]) =>
    new HttpProblem(409, 'Conflict', detail, errors),
  invalid: (errors: FieldError[]) =>
    new HttpProblem(422, 'Invalid input', 'Some fields need correcting.', errors),
};

/** The `type` URI of a status: a stable, documented link per kind of problem. */
export function problemType(status: number): string {
  return `https://printwarden.test/problems/${status}`;
}
