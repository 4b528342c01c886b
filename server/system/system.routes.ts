import type { Sequelize } from 'sequelize';
import type { AppConfig } from '../config';
import { notFound } from '../http/errors';
import { defineRoute, Reply } from '../http/route';
import { readDevInbox } from '../mail/devInbox';
import { DEMO_PASSWORD, DEMO_USERS } from '../seed/demoAccounts';

export function systemRoutes(config: AppConfig, sequelize: Sequelize) {
  return [
    defineRoute({
      method: 'get', path: '/health', access: 'public',
      async handle() {
        try {
          await sequelize.query('SELECT 1');
          return { ok: true, db: 'up' };
        } catch {
          return new Reply(503, { ok: false, db: 'down' });
        }
      },
    }),
    defineRoute({
      method: 'get', path: '/meta', access: 'public',
      handle: async () => ({
        demo: config.demo,
        // The demo sign-ins are public knowledge only in demo mode.
        demoSignIns: config.demo ? DEMO_USERS.map((u) => ({ email: u.email, role: u.role, password: DEMO_PASSWORD })) : [],
        devMail: config.devMailDir !== null,
      }),
    }),
    defineRoute({
      // Captured mail holds invitation links: only people signed in to this development server may read it.
      method: 'get', path: '/dev/mail', access: 'signedIn',
      async handle() {
        if (!config.devMailDir) throw notFound('The development inbox');
        return readDevInbox(config.devMailDir);
      },
    }),
  ];
}
