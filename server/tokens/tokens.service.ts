import { ApiToken } from './apiToken.model';
import { hashSecret, newSecret } from '../auth/secretToken';
import { notFound } from '../http/errors';

const PREFIX = 'ckt_';

export async function createToken(nurseryId: number, createdBy: number | null, name: string) {
  const { secret, hash } = newSecret(PREFIX);
  const token = await ApiToken.create({ nurseryId, createdBy, name, tokenHash: hash, hint: secret.slice(0, 10) });
  return { ...token.toPublic(), token: secret };
}

export async function listTokens(nurseryId: number) {
  const tokens = await ApiToken.findAll({ where: { nurseryId }, order: [['createdAt', 'DESC']] });
  return tokens.map((t) => t.toPublic());
}

export async function revokeToken(nurseryId: number, id: number) {
  const token = await ApiToken.findOne({ where: { id, nurseryId } });
  if (!token) throw notFound('That token');
  if (!token.revokedAt) await token.update({ revokedAt: new Date() });
  return token.toPublic();
}

/** Resolves a bearer token to its nursery, or null when unknown or revoked. */
export async function findActiveToken(secret: string) {
  if (!secret.startsWith(PREFIX)) return null;
  const token = await ApiToken.findOne({ where: { tokenHash: hashSecret(secret) } });
  if (!token || token.revokedAt) return null;
  // Recording use at most once a minute keeps a busy import from writing on every request.
  if (!token.lastUsedAt || Date.now() - token.lastUsedAt.getTime() > 60_000) await token.update({ lastUsedAt: new Date() });
  return token;
}
