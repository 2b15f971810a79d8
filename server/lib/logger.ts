import type { IncomingMessage } from 'node:http';
import { pino, type DestinationStream } from 'pino';
import { pinoHttp } from 'pino-http';
import type { Config } from '../config/env';

/**
 * Tests are quiet unless TEST_LOG=1, which shows every request and any 500's stack while debugging. A test that reads
 * the log passes its own destination and gets every line at the configured level.
 */
export const createLogger = (config: Pick<Config, 'logLevel' | 'env'>, destination?: DestinationStream) =>
  destination
    ? pino({ level: config.logLevel }, destination)
    : pino({ level: config.env === 'test' && !process.env.TEST_LOG ? 'silent' : config.logLevel });
export type Logger = ReturnType<typeof createLogger>;

/**
 * Links sent by e-mail carry their token in the path, both the API's and the pages' a browser opens from the mail.
 * Invitation paths also serve numeric ids (/api/invitations/12/resend), which are kept.
 */
const TOKEN_PATHS: RegExp[] = [
  /^(\/api\/auth\/password-reset\/)[^/?#]+/,
  /^(\/api\/invitations\/)(?!\d+(?:[/?#]|$))[^/?#]+/,
  /^(\/reset-password\/)[^/?#]+/,
  /^(\/invitation\/)[^/?#]+/,
  /^(\/api\/verify\/)[^/?#]+/,
  /^(\/verify\/)[^/?#]+/,
];

/** The URL as it may appear in a log: any link token replaced by ":token", the query kept. */
export function redactUrl(url: string): string {
  for (const pattern of TOKEN_PATHS) {
    if (pattern.test(url)) return url.replace(pattern, '$1:token');
  }
  return url;
}

interface SerializedReq {
  id: unknown;
  method: string;
  url: string;
  remoteAddress?: string;
}

/**
 * One line per request with only what a reader of the log needs: request id, method, path, status and duration.
 * Headers are left out altogether (Cookie, Authorization, and a Referer that may carry a reset link), and so are
 * the route's params, which hold tokens.
 */
export function httpLogger(logger: Logger) {
  return pinoHttp({
    logger,
    autoLogging: { ignore: (req: IncomingMessage) => req.url === '/api/health' },
    serializers: {
      req: (req: SerializedReq) => ({
        id: req.id,
        method: req.method,
        url: redactUrl(req.url),
        remoteAddress: req.remoteAddress,
      }),
      res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
    },
  });
}
