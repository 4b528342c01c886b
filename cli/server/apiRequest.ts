import { failure } from '../output/cliError';
import type { ServerConfig } from './config';

/** The server's error shape, or null when the answer was not ours. */
async function serverError(res: Response): Promise<{ code: string; message: string } | null> {
  try {
    const body = (await res.json()) as { error?: { code: string; message: string } };
    return body.error ?? null;
  } catch {
    return null;
  }
}

export class ServerRefusal extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
  ) {
    super(message);
  }
}

/** Calls the Coldknit API with the token; unreachable servers and refused tokens become clear, final failures. */
export async function apiRequest<T>(config: ServerConfig, path: string, init: RequestInit = {}): Promise<T> {
  let res: Response;
  try {
    res = await fetch(`${config.server}/api${path}`, {
      ...init,
      headers: { accept: 'application/json', authorization: `Bearer ${config.token}`, ...init.headers },
    });
  } catch (err) {
    const cause = (err as { cause?: { code?: string } }).cause?.code ?? (err as Error).message;
    throw failure(`Could not reach the Coldknit server at ${config.server} (${cause}).`);
  }
  if (res.status === 401) throw failure('The server refused the token: it is unknown or revoked. Make a new one in Settings → API tokens.');
  if (!res.ok) {
    const error = await serverError(res);
    throw new ServerRefusal(res.status, error?.code ?? 'http_error', error?.message ?? `The server answered ${res.status}.`);
  }
  return (await res.json()) as T;
}
