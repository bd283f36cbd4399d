import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { pino, type Logger } from 'pino';
import { pinoHttp } from 'pino-http';
import { httpLogSerializers, logger as appLogger } from '../logger';

/**
 * The request log. At `info` and below, pino-http writes a line per request (health probes left out).
 * Above it (`LOG_LEVEL=warn`, say) no request line is ever written, so requests skip pino-http's work
 * per request (a child logger with the request serialized and redacted, listeners on the response):
 * `req.log` is made only when something logs through it (an error), with the request bound as
 * pino-http binds it.
 */
export function requestLog(logger: Logger = appLogger): RequestHandler {
  if (logger.isLevelEnabled('info')) {
    return pinoHttp({ logger, serializers: httpLogSerializers, autoLogging: { ignore: (req) => req.url === '/api/health' } });
  }
  const withRequest = logger.child({}, { serializers: { req: (req: Parameters<typeof pino.stdSerializers.req>[0]) => httpLogSerializers.req(pino.stdSerializers.req(req) as never) } });
  return (req: Request, _res: Response, next: NextFunction) => {
    let log: Logger | undefined;
    Object.defineProperty(req, 'log', { configurable: true, enumerable: false, get: () => (log ??= withRequest.child({ req })) });
    next();
  };
}
