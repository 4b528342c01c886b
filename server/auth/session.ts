import type { CookieOptions, Response } from 'express';
import jwt from 'jsonwebtoken';

export const SESSION_COOKIE = 'ck_session';
const LIFETIME_SECONDS = 14 * 24 * 3600;

export interface SessionClaims {
  sub: string;
  /** The user's session version: a password change bumps it and ends older sessions. */
  sv: number;
}

const cookieOptions = (secure: boolean): CookieOptions => ({ httpOnly: true, sameSite: 'lax', secure, path: '/' });

export function issueSession(res: Response, secret: string, secure: boolean, user: { id: number; sessionVersion: number }) {
  const token = jwt.sign({ sv: user.sessionVersion } satisfies Omit<SessionClaims, 'sub'>, secret, {
    subject: String(user.id),
    expiresIn: LIFETIME_SECONDS,
    algorithm: 'HS256',
  });
  res.cookie(SESSION_COOKIE, token, { ...cookieOptions(secure), maxAge: LIFETIME_SECONDS * 1000 });
}

export function clearSession(res: Response, secure: boolean) {
  res.clearCookie(SESSION_COOKIE, cookieOptions(secure));
}

export function readSession(token: string, secret: string): SessionClaims | null {
  try {
    const claims = jwt.verify(token, secret, { algorithms: ['HS256'] }) as jwt.JwtPayload;
    if (typeof claims.sub !== 'string' || typeof claims.sv !== 'number') return null;
    return { sub: claims.sub, sv: claims.sv };
  } catch {
    return null;
  }
}
