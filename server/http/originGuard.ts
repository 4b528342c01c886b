import type { RequestHandler } from 'express';
import { forbidden } from './errors';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Refuses state-changing requests another site makes on a signed-in user's behalf. Browsers send Sec-Fetch-Site and
 * Origin; the CLI sends neither and is judged by its token alone.
 */
export function originGuard(appOrigin: string): RequestHandler {
  return (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    const site = req.get('sec-fetch-site');
    const origin = req.get('origin');
    if (site === 'cross-site') return next(forbidden('Cross-site requests may not change data.'));
    if (origin && origin !== appOrigin && origin !== ownOrigin(req)) {
      return next(forbidden('Requests from another origin may not change data.'));
    }
    next();
  };
}

function ownOrigin(req: Parameters<RequestHandler>[0]): string {
  return `${req.protocol}://${req.get('host')}`;
}
