import type { RequestHandler } from 'express';
import { User } from '../users/user.model';
import { findActiveToken } from '../tokens/tokens.service';
import { unauthorized } from '../http/errors';
import { readSession, SESSION_COOKIE } from './session';

/**
 * Establishes req.auth from an API token (Authorization: Bearer) or the session cookie. The user row is read on every
 * request, so a changed role or password takes effect at once and no server keeps sessions in memory.
 */
export function authenticate(secret: string): RequestHandler {
  return async (req, _res, next) => {
    const header = req.get('authorization');
    if (header) {
      const match = /^Bearer\s+(\S+)$/i.exec(header);
      const token = match ? await findActiveToken(match[1]) : null;
      if (!token) return next(unauthorized('That API token is not valid or has been revoked.'));
      req.auth = { userId: null, nurseryId: token.nurseryId, role: 'staff', via: 'token', tokenId: token.id };
      return next();
    }
    const cookie = req.cookies?.[SESSION_COOKIE] as string | undefined;
    const claims = cookie ? readSession(cookie, secret) : null;
    if (claims) {
      const user = await User.findByPk(Number(claims.sub));
      if (user && user.sessionVersion === claims.sv) {
        req.auth = { userId: user.id, nurseryId: user.nurseryId, role: user.role, via: 'session', tokenId: null };
      }
    }
    next();
  };
}
