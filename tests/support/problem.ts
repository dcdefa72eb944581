import { expect } from 'vitest';
import type { Response } from 'supertest';

/** Asserts an RFC 9457 problem-details answer with the given status. */
export function expectProblem(response: Response, status: number): void {
  expect(response.status).toBe(status);
  expect(response.headers['content-type']).toMatch(/^application\/problem\+json/);
  expect(response.body).toMatchObject({
    status,
    type: expect.any(String),
    title: expect.any(String),
  });
}

/** The paths named in a 422's `errors[]`. */
export function errorPaths(response: Response): string[] {
  return (response.body.errors as Array<{ path: string }>).map((error) => error.path);
}
