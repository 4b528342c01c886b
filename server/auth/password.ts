import bcrypt from 'bcryptjs';

/** Cost 12: about a quarter second here, well above the minimum of 10 the project requires. */
const COST = Number(process.env.BCRYPT_COST ?? 12);

export const hashPassword = (plain: string) => bcrypt.hash(plain, Math.max(10, COST));
export const verifyPassword = (plain: string, hash: string) => bcrypt.compare(plain, hash);
