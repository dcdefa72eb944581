import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import type { Request } from 'express';
import { pinoHttp } from 'pino-http';
import type { Logger } from './logger';

/** Request ids from a proxy are kept only when they look like ids, never free text. */
const REQUEST_ID = /^[\w-]{8,64}$/;

/**
 * One log line per request: request id, user id, method, route pattern, status, time.
 * Only these fields are written: the URL (which may carry an invitation or reset token),
 * headers (cookie, CSRF) and bodies (passwords) never reach the log.
 */
export function requestLogger(
  logger: Logger,
  routeOf: (method: string, path: string) => string | null,
) {
  return pinoHttp({
    logger,
    genReqId: (req: IncomingMessage, res: ServerResponse) => {
      const given = req.headers['x-request-id'];
      const id = typeof given === 'string' && REQUEST_ID.test(given) ? given : randomUUID();
      res.setHeader('X-Request-Id', id);
      return id;
    },
    customAttributeKeys: { reqId: 'requestId', responseTime: 'ms' },
    // Bind only the request id, never the whole request (URL, headers) to the log.
    quietReqLogger: true,
    quietResLogger: true,
    wrapSerializers: false,
    serializers: {
      // pino-http binds the whole request to a child logger on every request, which ran
      // pino's redaction over it (half a millisecond a request); the line never shows it.
      req: () => undefined,
      res: (res: ServerResponse) => ({ status: res.statusCode }),
      err: (err: Error) => ({ type: err.name, message: err.message }),
    },
    customProps: (req: IncomingMessage, res: ServerResponse) => {
      // pino-http asks at the start too; only the finished request has a user and route.
      if (!res.headersSent) return {};
      const request = req as Request;
      const path = (request.originalUrl ?? '/').split('?')[0]!;
      const route =
        routeOf(request.method, path) ?? (path.startsWith('/api') ? '(no route)' : '(client)');
      const userId = (request.user as { id?: number } | undefined)?.id ?? null;
      return { userId, method: request.method, route };
    },
    customLogLevel: (_req, res, error) =>
      error || res.statusCode >= 500 ? 'error' : res.statusCode >= 400 ? 'warn' : 'info',
    customSuccessMessage: (req, res) => `${req.method} ${res.statusCode}`,
    customErrorMessage: (req, res) => `${req.method} ${res.statusCode}`,
  });
}
