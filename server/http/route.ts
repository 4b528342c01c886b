import { Router, type Request, type RequestHandler, type Response } from 'express';
import type { z } from 'zod';
import { ROLE_RANK, type Role } from '../../shared/schemas/common';
import { forbidden, unauthorized } from './errors';

/** Who is asking, established by the authenticate middleware from the session cookie or an API token. */
export interface AuthContext {
  userId: number | null;
  nurseryId: number;
  role: Role;
  /** API tokens may only import and read; the route says whether it accepts them. */
  via: 'session' | 'token';
  tokenId: number | null;
}

declare module 'express-serve-static-core' {
  interface Request {
    auth?: AuthContext;
  }
}

/** `public` needs no sign-in; `signedIn` any role; otherwise the least role allowed. */
export type Access = 'public' | 'signedIn' | Role;

/** A handler returns plain data for 200, or a Reply to choose another status. */
export class Reply {
  constructor(
    readonly status: number,
    readonly body?: unknown,
  ) {}
}
export const created = (body: unknown) => new Reply(201, body);
export const noContent = () => new Reply(204);

type Schema = z.ZodType;
type Out<S> = S extends z.ZodType ? z.output<S> : undefined;

export interface RouteSpec<P extends Schema | undefined, Q extends Schema | undefined, B extends Schema | undefined> {
  method: 'get' | 'post' | 'patch' | 'put' | 'delete';
  path: string;
  access: Access;
  /** API tokens reach reads and the routes that say so here (imports). */
  tokens?: boolean;
  params?: P;
  query?: Q;
  body?: B;
  /** Middleware that must run before validation, such as multer for uploads. */
  before?: RequestHandler[];
  handle(input: { params: Out<P>; query: Out<Q>; body: Out<B>; auth: AuthContext; req: Request; res: Response }): Promise<unknown | Reply>;
}

export interface RouteInfo {
  method: string;
  path: string;
  access: Access;
  tokens: boolean;
}

function checkAccess(spec: { access: Access; tokens?: boolean; method: string }, auth: AuthContext | undefined): AuthContext {
  if (spec.access === 'public') return auth as AuthContext;
  if (!auth) throw unauthorized();
  if (auth.via === 'token' && !(spec.tokens || spec.method === 'get')) throw forbidden('API tokens may only import files and read.');
  if (spec.access !== 'signedIn' && ROLE_RANK[auth.role] < ROLE_RANK[spec.access]) throw forbidden();
  return auth;
}

/**
 * Routes are declared as data: access level and zod schemas beside the handler. The handler stays thin
 * (validated input → service → JSON), and the role-matrix test can list every route from the table.
 */
export function defineRoute<P extends Schema | undefined = undefined, Q extends Schema | undefined = undefined, B extends Schema | undefined = undefined>(
  spec: RouteSpec<P, Q, B>,
): RouteSpec<Schema | undefined, Schema | undefined, Schema | undefined> {
  return spec as unknown as RouteSpec<Schema | undefined, Schema | undefined, Schema | undefined>;
}

export function mountRoutes(routes: RouteSpec<Schema | undefined, Schema | undefined, Schema | undefined>[]): { router: Router; table: RouteInfo[] } {
  const router = Router();
  for (const spec of routes) {
    const handler: RequestHandler = async (req, res) => {
      const auth = checkAccess(spec, req.auth);
      const params = spec.params ? spec.params.parse(req.params) : undefined;
      const query = spec.query ? spec.query.parse(req.query) : undefined;
      const body = spec.body ? spec.body.parse(req.body ?? {}) : undefined;
      const result = await spec.handle({ params, query, body, auth, req, res } as never);
      if (res.headersSent) return;
      if (result instanceof Reply) {
        if (result.body === undefined) res.status(result.status).end();
        else res.status(result.status).json(result.body);
      } else {
        res.json(result);
      }
    };
    // Access is checked before any upload middleware so a viewer's file is never read.
    const gate: RequestHandler = (req, _res, next) => {
      checkAccess(spec, req.auth);
      next();
    };
    router[spec.method](spec.path, gate, ...(spec.before ?? []), handler);
  }
  return {
    router,
    table: routes.map((r) => ({ method: r.method.toUpperCase(), path: `/api${r.path}`, access: r.access, tokens: !!r.tokens || r.method === 'get' })),
  };
}
