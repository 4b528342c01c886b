import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { Sequelize } from 'sequelize';
import { loginBody, passwordChangeBody, preferencesBody, signupBody } from '../../shared/schemas/auth';
import type { AppConfig } from '../config';
import { ApiError } from '../http/errors';
import { created, defineRoute, noContent } from '../http/route';
import { User } from '../users/user.model';
import { changePassword, currentUser, login, signup } from './auth.service';
import { clearSession, issueSession } from './session';

export function authRoutes(config: AppConfig, sequelize: Sequelize) {
  // Keyed by address and e-mail so one person's typos do not lock out the rest of the crew behind the same router.
  const loginLimiter = rateLimit({
    windowMs: 15 * 60 * 1000,
    limit: config.loginRateLimit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    // Only failures count: a crew signing in all day on one router is not an attack.
    skipSuccessfulRequests: true,
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}|${String(req.body?.email ?? '').toLowerCase()}`,
    handler: (_req, _res, next) => next(new ApiError(429, 'too_many_attempts', 'Too many sign-in attempts; wait 15 minutes and try again.')),
  });
  const session = (res: Parameters<typeof issueSession>[0], user: User) => issueSession(res, config.jwtSecret, config.secureCookies, user);

  return [
    defineRoute({
      method: 'post', path: '/auth/login', access: 'public', body: loginBody, before: [loginLimiter],
      async handle({ body, res }) {
        const user = await login(body.email, body.password);
        session(res, user);
        return currentUser(user.id);
      },
    }),
    defineRoute({
      method: 'post', path: '/auth/logout', access: 'public',
      async handle({ res }) {
        clearSession(res, config.secureCookies);
        return noContent();
      },
    }),
    defineRoute({
      method: 'get', path: '/auth/me', access: 'signedIn',
      handle: async ({ auth }) => {
        if (auth.userId === null) throw new ApiError(400, 'not_a_user', 'API tokens have no user; use /api/nursery.');
        return currentUser(auth.userId);
      },
    }),
    defineRoute({
      method: 'post', path: '/auth/signup', access: 'public', body: signupBody, before: [loginLimiter],
      async handle({ body, res }) {
        const user = await signup(sequelize, body);
        session(res, user);
        return created(await currentUser(user.id));
      },
    }),
    defineRoute({
      method: 'post', path: '/auth/password', access: 'signedIn', body: passwordChangeBody,
      async handle({ body, auth, res }) {
        const user = await changePassword(auth.userId!, body.currentPassword, body.newPassword);
        session(res, user);
        return noContent();
      },
    }),
    defineRoute({
      method: 'patch', path: '/auth/preferences', access: 'signedIn', body: preferencesBody,
      async handle({ body, auth }) {
        await User.update({ unit: body.unit }, { where: { id: auth.userId! } });
        return currentUser(auth.userId!);
      },
    }),
  ];
}
