import bcrypt from 'bcryptjs';

// Cost 10 keeps sign-in near 60 ms on this class of machine; tests lower it.
const COST = Number(process.env.BAYWALK_BCRYPT_COST ?? 10);

/** Hashes a password for storage; the clear text is never kept or logged. */
export const hashPassword = (password: string) => bcrypt.hash(password, COST);

/** Compares a password with a stored hash in constant time. */
export const verifyPassword = (password: string, hash: string) => bcrypt.compare(password, hash);
