import { pino, type DestinationStream, type Logger } from 'pino';

export type { Logger };

/**
 * Paths pino blanks in every log line, in case a later change logs a request, a body or
 * a user record whole. The request logger itself only ever writes the fields it picks.
 */
export const REDACT_PATHS = [
  'password',
  'token',
  'csrfToken',
  'passwordHash',
  '*.password',
  '*.token',
  '*.csrfToken',
  '*.passwordHash',
  'req.headers.cookie',
  'req.headers["x-csrf-token"]',
  'res.headers["set-cookie"]',
];

/** The server's structured logger (JSON lines on stdout unless a stream is given). */
export function createLogger(level: string, destination?: DestinationStream): Logger {
  return pino(
    { level, base: undefined, redact: { paths: REDACT_PATHS, censor: '[redacted]' } },
    destination,
  );
}
