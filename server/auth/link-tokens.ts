import crypto from 'node:crypto';

/** A new single-use link token (256 random bits, base64url) and the hash to store. Only the mail carries the token. */
export function newLinkToken(): { token: string; hash: string } {
  const token = crypto.randomBytes(32).toString('base64url');
  return { token, hash: hashLinkToken(token) };
}

/** SHA-256 of a token, hex: what the database keeps and looks up. */
export function hashLinkToken(token: string): string {
  return crypto.createHash('sha256').update(token, 'utf8').digest('hex');
}

/** A link into the web app carrying a token in the query string. */
export function linkTo(origin: string, screen: string, token: string): string {
  return `${origin}${screen}?token=${encodeURIComponent(token)}`;
}
