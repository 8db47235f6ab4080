import bcrypt from 'bcryptjs';

/** bcrypt cost; 10 is the floor the project accepts, 12 the default. */
export const BCRYPT_COST = Number(process.env.BCRYPT_COST ?? 12) >= 10 ? Number(process.env.BCRYPT_COST ?? 12) : 10;

export const hashPassword = (plain: string) => bcrypt.hash(plain, BCRYPT_COST);
export const verifyPassword = (plain: string, hash: string) => bcrypt.compare(plain, hash);

/** A real hash to compare against when the e-mail is unknown, so timing does not tell. */
export const DUMMY_HASH = bcrypt.hashSync('not-a-real-password', 10);
